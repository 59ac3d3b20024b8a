import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { vesselsQuery } from '../../../lib/vessels';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import type { LogEntry, Measurements } from '../../../../shared/schemas/batch-log';
import { ROLE_LABELS, type Role } from '../../../../shared/schemas/roles';
import { Button, Dialog, TextAreaField, cx } from '../../../components/ui';
import { logEntry } from '../api/log-entry';
import { MeasurementFields, toMeasurements, type BrixToSg, type GravityUnit, type Typed } from './measurement-fields';
import { refractometerSg } from '../../../../shared/brewing';
import { dateIn, todayIn } from './format';
import { entryWords, inRecordOrder, type RecordOrder } from '../../../../shared/batches/entry-words';
import { showTime } from '../../../lib/time';
import type { MeasureKey } from '../../../../shared/batches/brew-day';

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

/**
 * The log as recorded, each entry worded in full in the brewery's units (shared/batches/entry-words), by the
 * time it was observed or, on request, in the order it arrived; a correction sits beside the entry it
 * corrects, which is struck through, with both authors, both times and the device each came from.
 */
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
  // The bright tank a transfer went into is stored by id: its name comes from the vessel list.
  const vessels = useQuery({
    ...vesselsQuery(),
    enabled: entries.some((e) => e.kind === 'action' && 'toVesselId' in e.data),
  });
  const vesselName = (id: number) => vessels.data?.find((v) => v.id === id)?.name;
  const [order, setOrder] = useState<RecordOrder>('observed');
  return (
    <>
      <div className="no-print mb-2 flex items-center gap-2" role="group" aria-label="Order of entries">
        <Button
          variant={order === 'observed' ? 'primary' : 'secondary'}
          aria-pressed={order === 'observed'}
          onClick={() => setOrder('observed')}
        >
          By time observed
        </Button>
        <Button
          variant={order === 'arrival' ? 'primary' : 'secondary'}
          aria-pressed={order === 'arrival'}
          onClick={() => setOrder('arrival')}
        >
          By arrival
        </Button>
      </div>
      <ol className="divide-y divide-mist-200" aria-label="Log">
        {inRecordOrder(entries, order).map((e) => {
          const words = entryWords(e, { system, vesselName });
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
                  {words.title}
                  {words.details.length > 0 && <span className="tabular-nums"> · {words.details.join(' · ')}</span>}
                </p>
                <p className="text-sm text-ink-500">
                  {e.authorName} · {ROLE_LABELS[e.authorRole as Role] ?? e.authorRole} · observed{' '}
                  {entryTime(e.capturedAt, timeZone)} · received {entryTime(e.receivedAt, timeZone)} · device{' '}
                  {e.deviceId}
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
