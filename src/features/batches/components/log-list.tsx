import { useState } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import type { LogEntry, Measurements } from '../../../../shared/schemas/batch-log';
import { ROLE_LABELS, type Role } from '../../../../shared/schemas/roles';
import { Button, Dialog, TextAreaField, cx } from '../../../components/ui';
import { logEntry } from '../api/log-entry';
import { MeasurementFields, toMeasurements, type BrixToSg, type GravityUnit, type Typed } from './measurement-fields';
import { refractometerSg } from '../../../../shared/brewing';
import { dateIn, showMeasurements, todayIn } from './format';
import { showTime } from '../../../lib/time';
import type { MeasureKey } from '../../../../shared/batches/brew-day';

function what(e: LogEntry): string {
  const d = e.data as { label?: string; text?: string };
  if (e.kind === 'reading') return 'Gravity reading';
  if (e.kind === 'note') return `${(e.data as { deviation?: boolean }).deviation ? 'Deviation' : 'Note'}: ${d.text}`;
  if (e.kind === 'correction') return `Correction: ${e.reason}`;
  if (e.kind === 'sign_off') return 'Brew day signed off';
  return d.label ?? e.kind;
}

/** What an entry measured: its measurements, or a cellar reading's gravity, temperature and pH. */
function measuredIn(e: LogEntry): Measurements | undefined {
  if (e.kind !== 'reading') return e.data.measurements as Measurements | undefined;
  const d = e.data as { sg: number; tempC: number | null; ph?: number };
  return {
    gravitySg: d.sg,
    ...(d.tempC === null ? {} : { tempC: d.tempC }),
    ...(d.ph === undefined ? {} : { ph: d.ph }),
  };
}

/** Entries a person may correct; a reading's correction may give a new gravity, temperature or pH. */
const CORRECTABLE = ['step', 'measurement', 'note', 'reading'];
const READING_ASKS: MeasureKey[] = ['gravitySg', 'tempC', 'ph'];

/** An entry's time, with its date when it is not from today in the brewery's zone (a week of readings at 12:46 must not look alike). */
export function entryTime(iso: string, timeZone: string, now: Date = new Date()): string {
  return showTime(iso, timeZone, dateIn(iso, timeZone) !== todayIn(timeZone, now));
}

/** The log as recorded: a corrected entry is struck through beside its correction, with both authors and times. */
export function LogList({
  batchId,
  entries,
  system,
  timeZone,
  stepAsks,
}: {
  batchId: number;
  entries: LogEntry[];
  system: UnitSystem;
  timeZone: string;
  /** What each brew-day step asks for, so a correction of a step logged without values can add them. */
  stepAsks?: ReadonlyMap<string, MeasureKey[]>;
}) {
  const [correcting, setCorrecting] = useState<LogEntry | null>(null);
  return (
    <>
      <ol className="divide-y divide-mist-200" aria-label="Log">
        {entries.map((e) => {
          const m = measuredIn(e);
          const corrected = e.correctedByIds.length > 0;
          return (
            <li
              key={e.id}
              className={cx('flex items-start gap-3 py-2', e.kind === 'correction' && 'pl-6')}
              data-testid="log-entry"
            >
              <span className="w-36 shrink-0 tabular-nums text-ink-500">{entryTime(e.capturedAt, timeZone)}</span>
              <span className="w-12 shrink-0 font-semibold tabular-nums text-ink-500" data-testid="entry-number">
                #{e.sequence}
              </span>
              <div className="flex-1">
                <p className={cx('font-medium', corrected && 'text-ink-500 line-through')}>
                  {what(e)}
                  {m && <span className="ml-2 tabular-nums">{showMeasurements(system, m)}</span>}
                  {e.kind === 'note' || typeof e.data.note !== 'string' || !e.data.note ? null : (
                    <span className="ml-2 text-ink-500">“{e.data.note}”</span>
                  )}
                </p>
                <p className="text-sm text-ink-500">
                  {e.authorName} · {ROLE_LABELS[e.authorRole as Role] ?? e.authorRole} · received{' '}
                  {entryTime(e.receivedAt, timeZone)}
                  {e.late && (
                    <span className="ml-2 rounded bg-brass-100 px-1 font-semibold text-ink-900">Late entry</span>
                  )}
                  {e.correctsEntryId && (
                    <span className="ml-2">corrects #{entries.find((x) => x.id === e.correctsEntryId)?.sequence}</span>
                  )}
                </p>
              </div>
              {CORRECTABLE.includes(e.kind) && (
                <Button
                  variant="quiet"
                  className="no-print"
                  onClick={() => setCorrecting(e)}
                  aria-label={`Correct entry ${e.sequence}`}
                >
                  Correct
                </Button>
              )}
            </li>
          );
        })}
      </ol>
      {correcting && (
        <CorrectionDialog
          batchId={batchId}
          entry={correcting}
          system={system}
          stepAsks={correcting.stepKey ? stepAsks?.get(correcting.stepKey) : undefined}
          onClose={() => setCorrecting(null)}
        />
      )}
    </>
  );
}

/** For a refractometer reading: its °Brix to SG with the same wort and alcohol corrections (shared/brewing). */
function refractometerOf(entry: LogEntry): BrixToSg | undefined {
  const d = entry.data as { gravityUnit?: string; originalBrix?: number; wortCorrection?: number };
  if (entry.kind !== 'reading' || d.gravityUnit !== 'brix') return undefined;
  return (brix) => refractometerSg(brix, d.originalBrix, d.wortCorrection);
}

function CorrectionDialog({
  batchId,
  entry,
  system,
  stepAsks = [],
  onClose,
}: {
  batchId: number;
  entry: LogEntry;
  system: UnitSystem;
  stepAsks?: MeasureKey[];
  onClose: () => void;
}) {
  const brixToSg = refractometerOf(entry);
  const [reason, setReason] = useState('');
  const [typed, setTyped] = useState<Typed>({});
  const [gravity, setGravity] = useState<GravityUnit>(brixToSg ? 'brix' : 'sg');
  const [error, setError] = useState<string | null>(null);
  // What the entry measured, and what its step asks for: a step logged without values can have them added.
  const measured = Object.keys(measuredIn(entry) ?? {}) as MeasureKey[];
  const asks =
    entry.kind === 'reading' ? READING_ASKS : [...measured, ...stepAsks.filter((k) => !measured.includes(k))];
  const submit = async () => {
    const { measurements, error: bad } = toMeasurements(typed, system, gravity, brixToSg);
    if (bad) return setError(bad);
    if (reason.trim().length < 3) return setError('Say why (at least 3 characters)');
    await logEntry(
      batchId,
      {
        kind: 'correction',
        correctsEntryId: entry.id,
        reason: reason.trim(),
        meaning: 'performed',
        ...(measurements ? { measurements } : {}),
      },
      `Correction of #${entry.sequence}`,
    );
    onClose();
  };
  return (
    <Dialog open onClose={onClose} title={`Correct entry #${entry.sequence}`}>
      <p className="mb-3 text-ink-500">The original stays in the log, struck through, beside your correction.</p>
      {asks.length > 0 && (
        <MeasurementFields
          asks={asks}
          expected={{}}
          typed={typed}
          onChange={setTyped}
          system={system}
          gravity={gravity}
          onGravityUnit={setGravity}
          brix={brixToSg !== undefined}
        />
      )}
      <div className="mt-3">
        <TextAreaField
          label="Reason"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          error={error ?? undefined}
        />
      </div>
      <div className="mt-4 flex justify-end gap-2">
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button size="lg" onClick={() => void submit()}>
          Save correction
        </Button>
      </div>
    </Dialog>
  );
}
