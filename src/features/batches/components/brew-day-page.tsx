import { useEffect, useMemo, useRef, useState } from 'react';
import { useParams } from 'react-router-dom';
import { brewDaySteps, boilAdditions, type BrewDayStep } from '../../../../shared/batches/brew-day';
import { BATCH_STATUS_LABELS } from '../../../../shared/schemas/batches';
import { Button, Card, ErrorState, LinkButton, Loading, TextAreaField, cx } from '../../../components/ui';
import { useCurrentUser, useCan } from '../../../lib/current-user';
import { outbox, useOutbox } from '../../../lib/outbox';
import type { OutboxItem } from '../../../lib/outbox-queue';
import { useBatch } from '../api/get-batch';
import { batchGroup, batchLogUrl, logEntry } from '../api/log-entry';
import { ActualsCard } from './actuals-card';
import { BoilTimer } from './boil-timer';
import { LogList } from './log-list';
import { MeasurementFields, refusalOf, toMeasurements, type GravityUnit, type Typed } from './measurement-fields';
import { draftFor, EMPTY_DRAFT, type StepDraft } from './step-draft';
import { OutboxPanel } from '../../../components/outbox-panel';
import { SignOffPanel, Signatures } from './sign-off-panel';
import { StatusCard } from './status-card';
import { showMeasurements } from './format';
import { StepDetails } from './step-details';
import { showTime } from '../../../lib/time';
import { useOnline } from './use-online';
import { useTapGuard } from './use-tap-guard';

interface Done {
  /** When the step was first done ("Log again" adds entries, never moves this). */
  at: string;
  waiting: boolean;
  /** How many times it was logged. */
  times: number;
}

/** When each step was first marked done (on the server, or still waiting on this device), and how often it was logged. */
export function doneSteps(
  entries: { kind: string; stepKey: string | null; capturedAt: string }[],
  waiting: OutboxItem[],
): Map<string, Done> {
  const done = new Map<string, Done>();
  const mark = (key: string, at: string, isWaiting: boolean) => {
    const before = done.get(key);
    done.set(key, before ? { ...before, times: before.times + 1 } : { at, waiting: isWaiting, times: 1 });
  };
  for (const e of entries) if (e.kind === 'step' && e.stepKey) mark(e.stepKey, e.capturedAt, false);
  for (const i of waiting) {
    const body = i.body as { kind?: string; stepKey?: string };
    if (i.state === 'waiting' && body.kind === 'step' && body.stepKey) mark(body.stepKey, i.capturedAt, true);
  }
  return done;
}

/** When the boil ended: flame-out, or the first step after it that was logged (a flame-out not marked). */
function boilEnd(steps: BrewDayStep[], done: Map<string, Done>): string | null {
  const from = steps.findIndex((s) => s.key === 'flame-out');
  if (from < 0) return null;
  const times = steps.slice(from).flatMap((s) => (done.has(s.key) ? [done.get(s.key)!.at] : []));
  return times.length ? times.reduce((a, b) => (Date.parse(a) <= Date.parse(b) ? a : b)) : null;
}

/** The tablet's brew-day screen: walk the plan step by step, measure, note, and sign off. */
export function BrewDayPage() {
  const id = Number(useParams().batchId);
  const me = useCurrentUser();
  const maySignOff = useCan('batch.signOff');
  const system = me.brewery.unitSystem;
  const timeZone = me.brewery.timeZone;
  const batch = useBatch(id);
  const { items } = useOutbox(batchGroup(id));
  const online = useOnline();
  const [selected, setSelected] = useState<string | null>(null);
  const [draft, setDraft] = useState<StepDraft>(EMPTY_DRAFT);
  const [gravity, setGravity] = useState<GravityUnit>('sg');
  /** What was typed for each entry this screen sent, so a refusal brings the values back (by idempotency key). */
  const sent = useRef(new Map<string, { stepKey: string; typed: Typed; gravity: GravityUnit }>());
  /** The refused entry whose values are back on screen: dismissed once the step is sent again. */
  const refused = useRef<string | null>(null);
  const guard = useTapGuard();
  const [note, setNote] = useState('');
  const [deviation, setDeviation] = useState(false);

  const plan = batch.data?.plan;
  const steps = useMemo(() => (plan ? brewDaySteps(plan) : []), [plan]);
  const additions = useMemo(() => (plan ? boilAdditions(plan) : []), [plan]);
  const stepAsks = useMemo(() => new Map(steps.map((s) => [s.key, s.asks])), [steps]);

  // The server refused a step this screen sent: go back to that step with what was typed, and say which field and why.
  useEffect(() => {
    for (const item of items) {
      const mine = sent.current.get(item.idempotencyKey);
      if (item.state !== 'rejected' || !mine) continue;
      sent.current.delete(item.idempotencyKey);
      const { message, field } = refusalOf(item, system, mine.gravity);
      refused.current = item.idempotencyKey;
      setSelected(mine.stepKey);
      setGravity(mine.gravity);
      setDraft({
        stepKey: mine.stepKey,
        typed: mine.typed,
        invalid: field,
        error: `Not saved: ${message}. Your values are kept: correct them and tap Done again.`,
      });
    }
  }, [items, system]);
  if (batch.isPending) return <Loading label="Opening the batch" />;
  if (batch.isError) return <ErrorState error={batch.error} onRetry={() => batch.refetch()} />;
  const b = batch.data;
  const done = doneSteps(b.entries, items);
  const current: BrewDayStep | undefined = steps.find((s) => s.key === selected) ?? steps.find((s) => !done.has(s.key));
  const shown = draftFor(draft, current?.key);
  const waitingCount = items.filter((i) => i.state === 'waiting').length;
  const signed = b.brewDaySigned;

  /** Logs the step once per press: a second tap while it is kept, or just after, is ignored (see useTapGuard). */
  const markDone = (step: BrewDayStep) => guard.run(step.key, selected === step.key, () => logStep(step));
  const logStep = async (step: BrewDayStep): Promise<boolean> => {
    const { typed } = draftFor(draft, step.key);
    const { measurements, error: bad, field } = toMeasurements(typed, system, gravity);
    if (bad) {
      setDraft({ stepKey: step.key, typed, error: bad, invalid: field });
      return false;
    }
    const item = await logEntry(
      id,
      {
        kind: 'step',
        stepKey: step.key,
        label: step.label,
        meaning: 'performed',
        ...(measurements ? { measurements } : {}),
      },
      measurements ? `${step.label} · ${showMeasurements(system, measurements)}` : step.label,
    );
    sent.current.set(item.idempotencyKey, { stepKey: step.key, typed, gravity });
    if (refused.current) {
      void outbox().dismiss(refused.current);
      refused.current = null;
    }
    setDraft(EMPTY_DRAFT);
    setSelected(null);
    return true;
  };

  return (
    <div className="space-y-4">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 className="text-3xl font-bold">
            {b.number} · {b.beerName}
          </h1>
          <p className="text-lg text-ink-700">
            {BATCH_STATUS_LABELS[b.status]} · brew date {b.brewDate}
            {b.vessel && ` · ${b.vessel.name}`}
          </p>
          {b.dumpedAt && (
            <p className="text-lg font-semibold text-ember-700">
              Dumped {showTime(b.dumpedAt, timeZone, true)}: {b.dumpedReason}
            </p>
          )}
        </div>
        <div className="flex items-center gap-2">
          <span
            className={cx(
              'rounded-full px-3 py-1 font-semibold',
              online ? 'bg-cellar-100 text-cellar-800' : 'bg-brass-400 text-ink-900',
            )}
            role="status"
          >
            {online ? 'Online' : 'Offline: entries kept on this tablet'}
          </span>
          <LinkButton to={`/batches/${id}/record`}>Record and QR labels</LinkButton>
        </div>
      </header>

      <div className="grid gap-4 lg:grid-cols-3">
        <div className="space-y-4 lg:col-span-2">
          {signed ? (
            <Card className="p-5">
              <h2 className="text-2xl font-bold">Brew day signed off</h2>
              <p className="mt-1 text-ink-700">Entries can only be corrected now: use “Correct” in the log.</p>
            </Card>
          ) : current ? (
            <Card className="p-5" aria-label="Current step">
              <p className="text-sm font-semibold uppercase tracking-wide text-ink-500">
                Step {steps.indexOf(current) + 1} of {steps.length}
              </p>
              <h2 className="text-3xl font-bold" data-testid="current-step">
                {current.label}
              </h2>
              <StepDetails step={current} system={system} />
              {current.asks.length > 0 && (
                <div className="mt-4">
                  <MeasurementFields
                    asks={current.asks}
                    expected={current.expected}
                    typed={shown.typed}
                    onChange={(typed) => setDraft({ stepKey: current.key, typed, error: null })}
                    system={system}
                    gravity={gravity}
                    onGravityUnit={setGravity}
                    invalid={shown.invalid}
                  />
                </div>
              )}
              {shown.error && (
                <p role="alert" className="mt-3 text-lg font-semibold text-ember-700">
                  {shown.error}
                </p>
              )}
              <Button
                size="xl"
                className="mt-5 w-full text-2xl"
                busy={guard.pending}
                onClick={() => void markDone(current)}
              >
                {done.has(current.key) ? 'Log again' : 'Done'}
              </Button>
            </Card>
          ) : (
            <Card className="p-5">
              <h2 className="text-2xl font-bold">Every step is logged</h2>
              <p className="text-ink-700">The head brewer can now review and sign off the brew day.</p>
            </Card>
          )}

          <Card className="p-4">
            <h2 className="text-lg font-bold">Steps</h2>
            <ol className="mt-2 grid grid-cols-2 gap-2">
              {steps.map((s, i) => {
                const d = done.get(s.key);
                return (
                  <li key={s.key}>
                    <button
                      type="button"
                      onClick={() => setSelected(s.key)}
                      aria-current={current?.key === s.key ? 'step' : undefined}
                      className={cx(
                        'flex min-h-[56px] w-full items-center justify-between gap-2 rounded-lg border-2 px-3 text-left',
                        current?.key === s.key
                          ? 'border-brass-500 bg-brass-100'
                          : d
                            ? 'border-cellar-600 bg-cellar-100'
                            : 'border-mist-300 bg-white',
                      )}
                    >
                      <span>
                        <span className="mr-2 tabular-nums text-ink-500">{i + 1}.</span>
                        {s.label}
                      </span>
                      {d && (
                        <span className="shrink-0 text-sm font-semibold tabular-nums">
                          {d.waiting ? 'Waiting' : '✓'} {showTime(d.at, timeZone)}
                          {d.times > 1 && <span className="ml-1 text-ink-500">×{d.times}</span>}
                        </span>
                      )}
                    </button>
                  </li>
                );
              })}
            </ol>
          </Card>
        </div>

        <div className="space-y-4">
          <OutboxPanel group={batchGroup(id)} timeZone={timeZone} noteUrl={batchLogUrl(id)} />
          <BoilTimer
            boilStartedAt={done.get('boil-start')?.at ?? null}
            boilEndedAt={boilEnd(steps, done)}
            boilMinutes={b.plan.equipment.boilMinutes}
            additions={additions}
            loggedMinutes={
              new Set(steps.filter((s) => s.boilMinute !== undefined && done.has(s.key)).map((s) => s.boilMinute!))
            }
            system={system}
            timeZone={timeZone}
          />
          {!signed && (
            <Card className="p-4">
              <h2 className="text-lg font-bold">Note or deviation</h2>
              <TextAreaField
                label="What happened"
                value={note}
                onChange={(e) => setNote(e.target.value)}
                placeholder="Stuck sparge, added rice hulls"
              />
              <label className="mt-2 flex min-h-touch items-center gap-3 text-base">
                <input
                  type="checkbox"
                  className="h-6 w-6"
                  checked={deviation}
                  onChange={(e) => setDeviation(e.target.checked)}
                />
                This is a deviation from the plan
              </label>
              <Button
                className="mt-2"
                size="lg"
                disabled={!note.trim()}
                onClick={() => {
                  void logEntry(
                    id,
                    { kind: 'note', text: note.trim(), deviation, meaning: 'performed' },
                    `${deviation ? 'Deviation' : 'Note'}: ${note.trim().slice(0, 40)}`,
                  );
                  setNote('');
                  setDeviation(false);
                }}
              >
                Save note
              </Button>
            </Card>
          )}
          <ActualsCard actuals={b.actuals} system={system} />
          <StatusCard batchId={id} status={b.status} />
          {b.signatures.length > 0 && <Signatures signatures={b.signatures} timeZone={timeZone} />}
          {maySignOff && !signed && <SignOffPanel batchId={id} pendingCount={waitingCount} />}
        </div>
      </div>

      <Card className="p-4">
        <h2 className="text-lg font-bold">Log</h2>
        {b.entries.length ? (
          <LogList batchId={id} entries={b.entries} system={system} timeZone={timeZone} stepAsks={stepAsks} />
        ) : (
          <p className="text-ink-500">Nothing logged yet.</p>
        )}
      </Card>
    </div>
  );
}
