/**
 * Display helpers: SI values (as stored) shown in the brewery's unit system.
 * Conversions come from shared/brewing; this file only chooses units and formats.
 */
import {
  cToF,
  fToC,
  kgToLb,
  lbToKg,
  lToUsGal,
  usGalToL,
  gToOz,
  ozToG,
  lPerKgToQtPerLb,
  qtPerLbToLPerKg,
  roundForMeasuring,
  type MeasuredAmount,
} from '../../shared/brewing';
import type { UnitSystem } from '../../shared/schemas/auth';

// A batch or tank volume in words is shared with the server's messages (fermenter size).
export { showVolume } from '../../shared/brewing';

/** What a stored SI number measures; `lPerKg` is water per grain (mash thickness, grain absorption). */
export type Quantity = 'weightKg' | 'weightG' | 'tempC' | 'volumeL' | 'lPerKg';

interface UnitInfo {
  unit: string;
  toDisplay: (si: number) => number;
  fromDisplay: (shown: number) => number;
  decimals: number;
}

const IDENTITY = (x: number) => x;

export const UNITS: Record<UnitSystem, Record<Quantity, UnitInfo>> = {
  us: {
    weightKg: { unit: 'lb', toDisplay: kgToLb, fromDisplay: lbToKg, decimals: 2 },
    weightG: { unit: 'oz', toDisplay: gToOz, fromDisplay: ozToG, decimals: 2 },
    tempC: { unit: '°F', toDisplay: cToF, fromDisplay: fToC, decimals: 1 },
    volumeL: { unit: 'gal', toDisplay: lToUsGal, fromDisplay: usGalToL, decimals: 1 },
    lPerKg: { unit: 'qt/lb', toDisplay: lPerKgToQtPerLb, fromDisplay: qtPerLbToLPerKg, decimals: 2 },
  },
  metric: {
    weightKg: { unit: 'kg', toDisplay: IDENTITY, fromDisplay: IDENTITY, decimals: 2 },
    weightG: { unit: 'g', toDisplay: IDENTITY, fromDisplay: IDENTITY, decimals: 0 },
    tempC: { unit: '°C', toDisplay: IDENTITY, fromDisplay: IDENTITY, decimals: 1 },
    volumeL: { unit: 'L', toDisplay: IDENTITY, fromDisplay: IDENTITY, decimals: 1 },
    lPerKg: { unit: 'L/kg', toDisplay: IDENTITY, fromDisplay: IDENTITY, decimals: 2 },
  },
};

/**
 * A limit message from the shared schemas, written in SI ("Rest temperature (°C) must be at most 80"),
 * restated in the units a field shows ("Rest temperature must be at most 176.0 °F"). Other messages pass unchanged.
 */
export function limitInUnits(message: string, system: UnitSystem, quantity: Quantity): string {
  const u = UNITS[system][quantity];
  const si = UNITS.metric[quantity].unit;
  const escaped = si.replace(/[/]/g, '\\/');
  const limit = new RegExp(`^(.+?) \\(${escaped}\\) must be at (most|least) (-?\\d+(?:\\.\\d+)?)$`).exec(message);
  if (limit)
    return `${limit[1]} must be at ${limit[2]} ${Number(u.toDisplay(Number(limit[3])).toFixed(u.decimals))} ${u.unit}`;
  return message.replace(` (${si}): `, ': ');
}

/** A number with its unit in the brewery's system, e.g. "152.6 °F" or "37.9 L". */
export function show(system: UnitSystem, quantity: Quantity, si: number, decimals?: number): string {
  const u = UNITS[system][quantity];
  return `${u.toDisplay(si).toFixed(decimals ?? u.decimals)} ${u.unit}`;
}

/** A rounded, measurable amount, e.g. "186 lb" or "62 tsp". */
export function showMeasured(m: MeasuredAmount): string {
  return `${Number(m.value.toFixed(3))} ${m.unit}`;
}

/** Weight of one sack of malt: 55 lb (US) or 25 kg (metric), common trade sizes (common practice, no source). */
export const SACK_KG: Record<UnitSystem, number> = { us: lbToKg(55), metric: 25 };

/** A grain weight to weigh out, with whole sacks called out when there is at least one. */
export function showGrain(system: UnitSystem, kg: number): string {
  const measured = showMeasured(roundForMeasuring({ value: kg, unit: 'kg' }, system));
  const sacks = Math.floor(kg / SACK_KG[system]);
  if (sacks < 1) return measured;
  const rest = roundForMeasuring({ value: kg - sacks * SACK_KG[system], unit: 'kg' }, system);
  return `${measured} (${sacks} sack${sacks > 1 ? 's' : ''}${rest.value > 0 ? ` + ${showMeasured(rest)}` : ''})`;
}

/** Hop and salt weights: oz and g side by side in US breweries (scales are often gram scales). */
export function showSmallWeight(system: UnitSystem, grams: number): string {
  const m = roundForMeasuring({ value: grams / 1000, unit: 'kg' }, system);
  if (system === 'us' && m.unit !== 'g')
    return `${showMeasured(m)} (${grams < 1000 ? grams.toFixed(0) + ' g' : (grams / 1000).toFixed(2) + ' kg'})`;
  return showMeasured(m);
}
