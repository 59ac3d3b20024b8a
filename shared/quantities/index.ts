/**
 * Every quantity Kettlewright handles, in one table: its SI unit, the widest SI limits the product accepts,
 * and the unit(s) and decimals a US or a metric brewery reads and types it in. Schemas (`quantityField`),
 * the server's messages and every screen read their limits, units and conversions from here.
 *
 * Conventions:
 * - Stored and sent values are SI: °C, L, kg, g, mL, kPa gauge, minutes, hours; gravity as specific gravity.
 *   A name carries its unit (`tempC`, `volumeL`, `weightKg`, `pressureKpa`).
 * - A share from 0 to 100 is named `…Pct` (`alphaAcidPct`, `attenuationPct`); a share from 0 to 1 is named
 *   `…Fraction` (`lossFraction`). Two stored names predate this rule and keep their spelling because signed
 *   records and recipe versions hold them: the equipment's `brewhouseEfficiency` (a fraction) and a grain
 *   bill item's `percent` (a percentage).
 * - A field may narrow a quantity's limits (a mash rest is 30–80 °C); it never widens them.
 */
import type { UnitSystem } from '../schemas/auth';
import * as c from './convert';

export type { UnitSystem };
export * from './convert';

/** One unit a quantity is shown and typed in. */
export interface DisplayUnit {
  /** Symbol written after the number ("°F", "gal"); empty for a bare number (pH). */
  unit: string;
  decimals: number;
  /** Always written with all its decimals ("1.200"), as the trade writes a specific gravity. */
  fixed?: boolean;
  fromSi: (si: number) => number;
  toSi: (shown: number) => number;
}

export interface QuantitySpec {
  /** What a message calls it when the field has no label of its own. */
  name: string;
  /** The SI unit stored and sent. */
  si: string;
  /** The widest limits the product accepts, in SI. */
  min: number;
  max: number;
  /** The unit each brewery reads and types first, then any other it may choose on a form. */
  units: Record<UnitSystem, readonly [DisplayUnit, ...DisplayUnit[]]>;
}

const same = (unit: string, decimals: number): DisplayUnit => ({
  unit,
  decimals,
  fromSi: (x) => x,
  toSi: (x) => x,
});
const scaled = (
  unit: string,
  decimals: number,
  fromSi: (si: number) => number,
  toSi: (shown: number) => number,
): DisplayUnit => ({ unit, decimals, fromSi, toSi });
const entry = (name: string, si: string, min: number, max: number, units: QuantitySpec['units']): QuantitySpec => ({
  name,
  si,
  min,
  max,
  units,
});
const both = (u: DisplayUnit): QuantitySpec['units'] => ({ us: [u], metric: [u] });

const FAHRENHEIT = scaled('°F', 1, c.cToF, c.fToC);
const CELSIUS = same('°C', 1);
const GALLONS = scaled('gal', 1, c.lToUsGal, c.usGalToL);
const BARRELS = scaled('bbl', 2, c.lToUsBbl, c.usBblToL);
const LITRES = same('L', 1);
const HECTOLITRES = scaled('hL', 2, c.lToHl, c.hlToL);
const SG: DisplayUnit = { ...same('SG', 3), fixed: true };
const PLATO = scaled('°P', 1, c.platoFromSg, c.sgFromPlato);
const percentOfFraction = scaled(
  '%',
  0,
  (f) => f * 100,
  (p) => p / 100,
);

/** Gravity: the lowest and highest specific gravity the formulas are trusted for. */
const GRAVITY_MIN_SG = 0.98;
const GRAVITY_MAX_SG = 1.2;

export const QUANTITIES = {
  /** A temperature: wort, beer, water, grain, a set-point. */
  temperature: entry('Temperature', '°C', -10, 110, { us: [FAHRENHEIT], metric: [CELSIUS] }),
  /** A batch, vessel or run volume. */
  volume: entry('Volume', 'L', 0, 200_000, { us: [GALLONS, BARRELS], metric: [LITRES, HECTOLITRES] }),
  /** A rate of volume per hour (boil-off). */
  volumePerHour: entry('Rate', 'L/h', 0, 2000, {
    us: [scaled('gal/h', 2, c.lToUsGal, c.usGalToL)],
    metric: [same('L/h', 1)],
  }),
  /** A container's size (cans, bottles). */
  smallVolume: entry('Size', 'mL', 50, 5000, {
    us: [scaled('fl oz', 1, c.mlToFlOz, c.flOzToMl)],
    metric: [same('mL', 0)],
  }),
  /** Grain and other weights counted in sacks and kilograms. */
  grainWeight: entry('Weight', 'kg', 0, 20_000, { us: [scaled('lb', 2, c.kgToLb, c.lbToKg)], metric: [same('kg', 2)] }),
  /** Hop weights. */
  hopWeight: entry('Weight', 'g', 0, 500_000, { us: [scaled('oz', 2, c.gToOz, c.ozToG)], metric: [same('g', 0)] }),
  /** Water salts: weighed on a gram scale in every brewery (common practice, no source). */
  saltWeight: entry('Salt', 'g', 0, 100_000, both(same('g', 1))),
  /** Water per grain: mash thickness and grain absorption. */
  waterToGrain: entry('Ratio', 'L/kg', 0, 10, {
    us: [scaled('qt/lb', 2, c.lPerKgToQtPerLb, c.qtPerLbToLPerKg)],
    metric: [same('L/kg', 2)],
  }),
  /** Specific gravity (20 °C/20 °C); °Plato is the same quantity on another scale. */
  gravity: entry('Gravity', 'SG', GRAVITY_MIN_SG, GRAVITY_MAX_SG, { us: [SG, PLATO], metric: [SG, PLATO] }),
  /** Gravity points above a reference (e.g. the D-rest trigger: points above FG). */
  gravityPoints: entry('Points', 'points', 0, 200, both(same('points', 0))),
  /** A refractometer reading: a measurement of its own, corrected to SG with the reading's factors. */
  brix: entry('Refractometer reading', '°Bx', 0, 40, both(same('°Bx', 1))),
  ph: entry('pH', 'pH', 2, 10, both(same('', 2))),
  /** Gauge pressure: head pressure, a vessel's rated working pressure (0 for an unpressurised vessel). */
  pressure: entry('Pressure', 'kPa', 0, 1000, {
    us: [scaled('psi', 1, c.kpaToPsi, c.psiToKpa)],
    metric: [same('kPa', 0)],
  }),
  minutes: entry('Time', 'min', 0, 240, both(same('min', 0))),
  hours: entry('Interval', 'h', 0, 24 * 14, both(same('h', 0))),
  co2Volumes: entry('CO₂', 'volumes', 0.5, 5, both(same('volumes', 2))),
  /** A share from 0 to 100 (`…Pct`). */
  percent: entry('Share', '%', 0, 100, both(same('%', 1))),
  /** A share from 0 to 1 (`…Fraction`), shown as a percentage. */
  fraction: entry('Share', 'fraction', 0, 1, both(percentOfFraction)),
  alphaAcid: entry('Alpha acid', '%', 0.1, 30, both(same('%', 1))),
  /** Dissolved ions in water, mg/L. */
  ionConcentration: entry('Concentration', 'ppm', 0, 2000, both(same('ppm', 0))),
  /** Beer colour, typed in SRM on every recipe (shared/brewing/colour.ts restates it in EBC). */
  beerColour: entry('Colour', 'SRM', 0, 80, both(same('SRM', 0))),
  /** Malt colour in degrees Lovibond, as maltsters ship it. */
  maltColour: entry('Colour', '°L', 0, 600, both(same('°L', 0))),
  bitterness: entry('Bitterness', 'IBU', 0, 150, both(same('IBU', 0))),
  /** Malt potential in gravity points per pound per US gallon; 46.2 is sucrose (shared/brewing/gravity.ts). */
  potential: entry('Potential', 'ppg', 1, 46.2, both(same('ppg', 1))),
  /** Yeast pitch rate, million cells per mL per °P. */
  pitchRate: entry('Pitch rate', 'M cells/mL/°P', 0.1, 3, both(same('M cells/mL/°P', 2))),
} satisfies Record<string, QuantitySpec>;

export type QuantityId = keyof typeof QUANTITIES;

/** The spec of a quantity. */
export const quantity = (id: QuantityId): QuantitySpec => QUANTITIES[id];

/** The unit a brewery reads and types a quantity in first. */
export const displayUnit = (id: QuantityId, system: UnitSystem): DisplayUnit => QUANTITIES[id].units[system][0];

/** A display unit of the quantity by its symbol, for a field that lets the person choose (gal or bbl). */
export function unitBySymbol(id: QuantityId, system: UnitSystem, symbol: string): DisplayUnit {
  return QUANTITIES[id].units[system].find((u) => u.unit === symbol) ?? displayUnit(id, system);
}

/** A shown number: without trailing zeros ("212", "0.26") unless its unit is written in full ("1.200"). */
const written = (n: number, u: DisplayUnit): string =>
  u.fixed ? n.toFixed(u.decimals) : String(Number(n.toFixed(u.decimals)));

/** A number with its unit, e.g. "152.6 °F" or "37.9 L", in `unit` (default the brewery's first). */
export function showQuantity(
  id: QuantityId,
  system: UnitSystem,
  si: number,
  opts: { unit?: DisplayUnit; decimals?: number } = {},
): string {
  const u = opts.unit ?? displayUnit(id, system);
  const text = u.fromSi(si).toFixed(opts.decimals ?? u.decimals);
  return u.unit ? `${text} ${u.unit}` : text;
}

/**
 * A batch or tank volume as a brewer says it: gallons below 2 bbl, barrels above (US); litres below
 * 200 L, hectolitres above (metric). For screens and for the API's messages alike.
 */
export function showVolume(system: UnitSystem, litres: number): string {
  const [small, large] = QUANTITIES.volume.units[system];
  const big = system === 'us' ? c.lToUsBbl(litres) >= 2 : litres >= 200;
  return showQuantity('volume', system, litres, { unit: big ? large : small, decimals: 1 });
}

export type Bound = 'min' | 'max';

/**
 * A limit as a person reads it, in `unit`: rounded inward to the unit's decimals, so the number stated is
 * one the field accepts ("at most 5283.4 gal" for 20 000 L, never 5283.5).
 */
export function boundShown(bound: Bound, si: number, unit: DisplayUnit): number {
  const shown = unit.fromSi(si);
  const step = 10 ** unit.decimals;
  // fromSi may be decreasing for no unit we have; every display unit rises with its SI value.
  const inward = bound === 'max' ? Math.floor(shown * step + 1e-9) : Math.ceil(shown * step - 1e-9);
  return inward / step;
}

/** What a refusal of a quantity's limit carries as data (a zod custom issue's `params`). */
export interface LimitRefusal {
  quantity: QuantityId;
  bound: Bound;
  /** The limit in SI. */
  si: number;
  /** What the field is called ("Rest temperature"). */
  label: string;
}

/** "Rest temperature must be at most 176 °F": a limit worded in `unit` (default the brewery's first). */
export function limitMessage(refusal: LimitRefusal, system: UnitSystem, unit?: DisplayUnit): string {
  const u = unit ?? displayUnit(refusal.quantity, system);
  const n = written(boundShown(refusal.bound, refusal.si, u), u);
  return `${refusal.label} must be at ${refusal.bound === 'max' ? 'most' : 'least'} ${u.unit ? `${n} ${u.unit}` : n}`;
}

/** Reads a `LimitRefusal` back from an issue's params, or null when the issue is not one. */
export function limitRefusalOf(params: unknown): LimitRefusal | null {
  if (!params || typeof params !== 'object') return null;
  const p = params as Partial<LimitRefusal>;
  return typeof p.quantity === 'string' &&
    p.quantity in QUANTITIES &&
    (p.bound === 'min' || p.bound === 'max') &&
    typeof p.si === 'number' &&
    typeof p.label === 'string'
    ? (p as LimitRefusal)
    : null;
}
