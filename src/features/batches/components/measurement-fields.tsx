import { MEASURES, measurementsSchema, type Measurements } from '../../../../shared/schemas/batch-log';
import { QUANTITIES, displayUnit, limitMessage, unitBySymbol, type DisplayUnit } from '../../../../shared/quantities';
import { issueRefusal } from '../../../../shared/quantities/field';
import { farFromExpected, type MeasureKey } from '../../../../shared/batches/brew-day';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { cx } from '../../../components/ui';

/** How gravity is typed; °Brix only where the field knows how the refractometer converts (a refractometer reading). */
export type GravityUnit = 'sg' | 'plato' | 'brix';
/** A refractometer's °Brix to SG, with the corrections of the reading it belongs to. */
export type BrixToSg = (brix: number) => number;
/** What the person typed, per measurement, in the units shown. */
export type Typed = Partial<Record<MeasureKey, string>>;

/** The unit a field is typed in (a °Bx reading is checked as the SG it converts to). */
function unitOf(key: MeasureKey, system: UnitSystem, gravity: GravityUnit): DisplayUnit {
  if (key === 'gravitySg') return unitBySymbol('gravity', system, gravity === 'plato' ? '°P' : 'SG');
  return displayUnit(MEASURES[key].quantity, system);
}
/** The symbol shown beside a field: °Bx for a refractometer reading; none for pH. */
const symbolOf = (key: MeasureKey, system: UnitSystem, gravity: GravityUnit): string =>
  key === 'gravitySg' && gravity === 'brix' ? '°Bx' : unitOf(key, system, gravity).unit;

/** An expected value in the field's unit; beside a °Bx field, the SG it is compared as, with its unit. */
export function expectedText(key: MeasureKey, si: number, system: UnitSystem, gravity: GravityUnit): string {
  const u = unitOf(key, system, gravity);
  const text = u.fromSi(si).toFixed(u.decimals);
  return key === 'gravitySg' && gravity === 'brix' ? `${text} ${u.unit}` : text;
}

/** The shared schema's limit a measurement (SI) breaks, said in the units the field shows; null when within. */
function limitProblem(key: MeasureKey, si: number, system: UnitSystem, gravity: GravityUnit): string | null {
  const result = measurementsSchema.shape[key].safeParse(si);
  const refusal = result.success ? null : issueRefusal(result.error.issues[0]!);
  return refusal && limitMessage(refusal, system, unitOf(key, system, gravity));
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
    if (!Number.isFinite(n)) return { error: `${MEASURES[key].label}: enter a number`, field: key };
    if (key === 'gravitySg' && gravity === 'brix') {
      if (!brixToSg) return { error: 'Gravity: enter SG or °P', field: key };
      const brix = QUANTITIES.brix;
      if (n < brix.min || n > brix.max)
        return { error: `Gravity: a refractometer reads ${brix.min} to ${brix.max} °Bx`, field: key };
      try {
        out.gravitySg = Number(brixToSg(n).toFixed(4));
      } catch (error) {
        return {
          error: `Gravity: ${error instanceof Error ? error.message : 'not a reading this converts'}`,
          field: key,
        };
      }
    } else {
      const digits = key === 'gravitySg' ? 4 : 2;
      out[key] = Number(unitOf(key, system, gravity).toSi(n).toFixed(digits));
    }
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
    if (!(key in MEASURES) || typeof si !== 'number') continue;
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
        const unit = symbolOf(key, system, gravity);
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
                {unit ? `${MEASURES[key].label} (${unit})` : MEASURES[key].label}
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
                {unit && !(key === 'gravitySg' && gravity === 'brix') ? ` ${unit}` : ''}: check it before marking done.
              </p>
            )}
          </div>
        );
      })}
    </div>
  );
}
