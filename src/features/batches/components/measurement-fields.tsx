import { platoToSg, sgToPlato } from '../../../../shared/brewing';
import type { Measurements } from '../../../../shared/schemas/batch-log';
import type { MeasureKey } from '../../../../shared/batches/brew-day';
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

/** Converts typed values to SI for the API; a value that is not a number is reported by its label. */
export function toMeasurements(typed: Typed, system: UnitSystem, gravity: GravityUnit, brixToSg?: BrixToSg): { measurements?: Measurements; error?: string } {
  const out: Measurements = {};
  for (const [key, text] of Object.entries(typed) as [MeasureKey, string | undefined][]) {
    if (!text?.trim()) continue;
    const n = Number(text.replace(',', '.'));
    if (!Number.isFinite(n)) return { error: `${NAMES[key]}: enter a number` };
    if (key === 'tempC') out.tempC = Number(UNITS[system].tempC.fromDisplay(n).toFixed(2));
    else if (key === 'volumeL') out.volumeL = Number(UNITS[system].volumeL.fromDisplay(n).toFixed(2));
    else if (key === 'gravitySg') {
      if (gravity !== 'sg' && (n < 0 || n > 40)) return { error: `Gravity: ${gravity === 'plato' ? '°P' : '°Bx'} is between 0 and 40` };
      if (gravity === 'brix' && !brixToSg) return { error: 'Gravity: enter SG or °P' };
      try {
        out.gravitySg = Number((gravity === 'sg' ? n : gravity === 'plato' ? platoToSg(n) : brixToSg!(n)).toFixed(4));
      } catch (error) {
        return { error: `Gravity: ${error instanceof Error ? error.message : 'not a reading this converts'}` };
      }
    } else out.ph = n;
  }
  return Object.keys(out).length ? { measurements: out } : {};
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
}) {
  return (
    <div className="grid grid-cols-2 gap-4">
      {asks.map((key) => {
        const id = `measure-${key}`;
        const want = expected[key];
        const unit = unitOf(key, system, gravity);
        return (
          <div key={key}>
            <div className="flex items-end justify-between gap-2">
              <label htmlFor={id} className="text-base font-semibold text-ink-700">
                {unit ? `${NAMES[key]} (${unit})` : NAMES[key]}
              </label>
              {key === 'gravitySg' && (
                <div role="group" aria-label="Gravity unit" className="flex overflow-hidden rounded-lg border-2 border-cellar-700">
                  {(brix ? (['sg', 'plato', 'brix'] as const) : (['sg', 'plato'] as const)).map((u) => (
                    <button
                      key={u}
                      type="button"
                      aria-pressed={gravity === u}
                      onClick={() => onGravityUnit(u)}
                      className={cx('min-h-touch min-w-touch px-3 font-semibold', gravity === u ? 'bg-cellar-700 text-white' : 'bg-white text-cellar-800')}
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
              onChange={(e) => onChange({ ...typed, [key]: e.target.value })}
              className="mt-1 block min-h-[64px] w-full rounded-lg border-2 border-mist-300 bg-white px-4 text-reading tabular-nums text-ink-900 focus:border-cellar-600 focus:outline-none"
            />
            {want !== undefined && (
              <p className="mt-1 text-base text-ink-500">
                Expected <span className="font-semibold tabular-nums text-ink-900">{expectedText(key, want, system, gravity)}</span>
              </p>
            )}
          </div>
        );
      })}
    </div>
  );
}
