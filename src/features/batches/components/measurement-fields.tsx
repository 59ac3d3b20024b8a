import { platoToSg, sgToPlato } from '../../../../shared/brewing';
import { MEASUREMENT_LIMITS, type Measurements } from '../../../../shared/schemas/batch-log';
import { farFromExpected, type MeasureKey } from '../../../../shared/batches/brew-day';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { UNITS } from '../../../lib/units';
import { cx } from '../../../components/ui';

/** How gravity is typed; °Brix only where the field knows how the refractometer converts (a refractometer reading). */
export type GravityUnit = 'sg' | 'plato' | 'brix';
/** A refractometer's °Brix to SG, with the corrections of the reading it belongs to. */
export type BrixToSg = (brix: number) => number;
/** What the person typed, per measurement, in the units shown. */
export type Typed = Partial<Record<MeasureKey, string>>;

/** The unit a field is typed in; pH has none. */
function unitOf(key: MeasureKey, system: UnitSystem, gravity: GravityUnit): string | null {
  if (key === 'tempC') return UNITS[system].tempC.unit;
  if (key === 'volumeL') return UNITS[system].volumeL.unit;
  if (key === 'gravitySg') return { sg: 'SG', plato: '°P', brix: '°Bx' }[gravity];
  return null;
}
const NAMES: Record<MeasureKey, string> = { tempC: 'Temperature', volumeL: 'Volume', gravitySg: 'Gravity', ph: 'pH' };

export function expectedText(key: MeasureKey, si: number, system: UnitSystem, gravity: GravityUnit): string {
  if (key === 'tempC') return UNITS[system].tempC.toDisplay(si).toFixed(1);
  if (key === 'volumeL') return UNITS[system].volumeL.toDisplay(si).toFixed(1);
  if (key === 'gravitySg') return gravity === 'sg' ? si.toFixed(3) : sgToPlato(si).toFixed(1);
  return si.toFixed(2);
}

/** A limit of the shared schema (SI) as the field shows it, e.g. 110 °C as "230 °F" for a US brewery. */
function limitText(key: MeasureKey, si: number, system: UnitSystem, gravity: GravityUnit): string {
  if (key === 'gravitySg')
    return gravity === 'plato' ? `${Number(sgToPlato(si).toFixed(1))} °P` : `${si.toFixed(3)} SG`;
  if (key === 'ph') return String(si);
  const u = UNITS[system][key];
  return `${Number(u.toDisplay(si).toFixed(1))} ${u.unit}`;
}

/** The shared schema's limit a measurement (SI) breaks, said in the units the field shows; null when within. */
function limitProblem(key: MeasureKey, si: number, system: UnitSystem, gravity: GravityUnit): string | null {
  const { min, max } = MEASUREMENT_LIMITS[key];
  if (si > max) return `${NAMES[key]} must be at most ${limitText(key, max, system, gravity)}`;
  if (si < min) return `${NAMES[key]} must be at least ${limitText(key, min, system, gravity)}`;
  return null;
}

/**
 * Converts typed values to SI for the API, checked against the shared schema's limits. A value that is not a
 * number or is out of range is reported by its label (in the units shown), with the field it belongs to.
 */
export function toMeasurements(
  typed: Typed,
  system: UnitSystem,
  gravity: GravityUnit,
  brixToSg?: BrixToSg,
): { measurements?: Measurements; error?: string; field?: MeasureKey } {
  const converted = convert(typed, system, gravity, brixToSg);
  if (converted.error || !converted.measurements) return converted;
  for (const [key, si] of Object.entries(converted.measurements) as [MeasureKey, number][]) {
    const problem = limitProblem(key, si, system, gravity);
    if (problem) return { error: problem, field: key };
  }
  return converted;
}

function convert(
  typed: Typed,
  system: UnitSystem,
  gravity: GravityUnit,
  brixToSg?: BrixToSg,
): { measurements?: Measurements; error?: string; field?: MeasureKey } {
  const out: Measurements = {};
  for (const [key, text] of Object.entries(typed) as [MeasureKey, string | undefined][]) {
    if (!text?.trim()) continue;
    const n = Number(text.replace(',', '.'));
    if (!Number.isFinite(n)) return { error: `${NAMES[key]}: enter a number`, field: key };
    if (key === 'tempC') out.tempC = Number(UNITS[system].tempC.fromDisplay(n).toFixed(2));
    else if (key === 'volumeL') out.volumeL = Number(UNITS[system].volumeL.fromDisplay(n).toFixed(2));
    else if (key === 'gravitySg') {
      if (gravity !== 'sg' && (n < 0 || n > 40))
        return { error: `Gravity: ${gravity === 'plato' ? '°P' : '°Bx'} is between 0 and 40`, field: key };
      if (gravity === 'brix' && !brixToSg) return { error: 'Gravity: enter SG or °P', field: key };
      try {
        out.gravitySg = Number((gravity === 'sg' ? n : gravity === 'plato' ? platoToSg(n) : brixToSg!(n)).toFixed(4));
      } catch (error) {
        return {
          error: `Gravity: ${error instanceof Error ? error.message : 'not a reading this converts'}`,
          field: key,
        };
      }
    } else out.ph = n;
  }
  return Object.keys(out).length ? { measurements: out } : {};
}

/**
 * Why the server refused an entry, naming the field and its limit in the units shown when a measurement is out of
 * range (the outbox keeps only the server's general message); otherwise the server's own message.
 */
export function refusalOf(
  item: { body: unknown; message?: string },
  system: UnitSystem,
  gravity: GravityUnit,
): { message: string; field?: MeasureKey } {
  const m = ((item.body ?? {}) as { measurements?: Measurements }).measurements ?? {};
  for (const [key, si] of Object.entries(m) as [MeasureKey, number][]) {
    if (!(key in NAMES) || typeof si !== 'number') continue;
    const problem = limitProblem(key, si, system, gravity);
    if (problem) return { message: problem, field: key };
  }
  return { message: (item.message ?? 'the server refused it').replace(/\.$/, '') };
}

/** Large numeric fields, one per measurement a step asks for, with the expected value beside each. */
export function MeasurementFields({
  asks,
  expected,
  typed,
  onChange,
  system,
  gravity,
  onGravityUnit,
  brix = false,
  invalid,
}: {
  asks: MeasureKey[];
  expected: Partial<Record<MeasureKey, number>>;
  typed: Typed;
  onChange: (next: Typed) => void;
  system: UnitSystem;
  gravity: GravityUnit;
  onGravityUnit: (unit: GravityUnit) => void;
  /** Offers °Bx beside SG and °P (correcting a refractometer reading). */
  brix?: boolean;
  /** The field the last check refused, marked for the person to find. */
  invalid?: MeasureKey;
}) {
  return (
    <div className="grid grid-cols-2 gap-4">
      {asks.map((key) => {
        const id = `measure-${key}`;
        const want = expected[key];
        const unit = unitOf(key, system, gravity);
        // A value far from the plan is allowed (the brewer measured it), but worth a second look before it is kept.
        const typedSi =
          want === undefined ? undefined : convert({ [key]: typed[key] }, system, gravity).measurements?.[key];
        const far =
          invalid !== key && typedSi !== undefined && want !== undefined && farFromExpected(key, typedSi, want);
        return (
          <div key={key}>
            {/* As tall as the SG/°P switch, so a field beside the gravity field starts at the same height. */}
            <div className="flex min-h-[48px] items-end justify-between gap-2">
              <label htmlFor={id} className="text-base font-semibold text-ink-700">
                {unit ? `${NAMES[key]} (${unit})` : NAMES[key]}
              </label>
              {key === 'gravitySg' && (
                <div
                  role="group"
                  aria-label="Gravity unit"
                  className="flex overflow-hidden rounded-lg border-2 border-cellar-700"
                >
                  {(brix ? (['sg', 'plato', 'brix'] as const) : (['sg', 'plato'] as const)).map((u) => (
                    <button
                      key={u}
                      type="button"
                      aria-pressed={gravity === u}
                      onClick={() => onGravityUnit(u)}
                      className={cx(
                        'min-h-touch min-w-touch px-3 font-semibold',
                        gravity === u ? 'bg-cellar-700 text-white' : 'bg-white text-cellar-800',
                      )}
                    >
                      {{ sg: 'SG', plato: '°P', brix: '°Bx' }[u]}
                    </button>
                  ))}
                </div>
              )}
            </div>
            <input
              id={id}
              inputMode="decimal"
              autoComplete="off"
              value={typed[key] ?? ''}
              aria-invalid={invalid === key || undefined}
              aria-describedby={far ? `${id}-far` : undefined}
              onChange={(e) => onChange({ ...typed, [key]: e.target.value })}
              className={cx(
                'mt-1 block min-h-[64px] w-full rounded-lg border-2 bg-white px-4 text-reading tabular-nums text-ink-900 focus:border-cellar-600 focus:outline-none',
                invalid === key ? 'border-ember-600' : far ? 'border-brass-500' : 'border-mist-300',
              )}
            />
            {want !== undefined && (
              <p className="mt-1 text-base text-ink-500">
                Expected{' '}
                <span className="font-semibold tabular-nums text-ink-900">
                  {expectedText(key, want, system, gravity)}
                </span>
              </p>
            )}
            {far && (
              <p id={`${id}-far`} className="mt-1 rounded bg-brass-100 px-2 py-1 text-base font-semibold text-ink-900">
                Far from the expected {expectedText(key, want, system, gravity)}
                {unit ? ` ${unit}` : ''}: check it before marking done.
              </p>
            )}
          </div>
        );
      })}
    </div>
  );
}
