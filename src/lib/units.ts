/**
 * Display helpers: SI values (as stored) shown in the brewery's unit system. Units, decimals and conversions
 * come from the quantities table (shared/quantities); this file only formats the brewery's own kinds of amount.
 */
import { lbToKg, roundForMeasuring, type MeasuredAmount } from '../../shared/brewing';
import { displayUnit, showQuantity, type QuantityId } from '../../shared/quantities';
import type { UnitSystem } from '../../shared/schemas/auth';

// A batch or tank volume in words is shared with the server's messages (fermenter size).
export { showVolume, displayUnit } from '../../shared/quantities';

/** A number with its unit in the brewery's system, e.g. "152.6 °F" or "37.9 L". */
export function show(system: UnitSystem, quantity: QuantityId, si: number, decimals?: number): string {
  return showQuantity(quantity, system, si, { decimals });
}

/** The number a field shows for an SI value, in the brewery's first unit and its decimals (no unit). */
export function shownNumber(system: UnitSystem, quantity: QuantityId, si: number): number {
  const u = displayUnit(quantity, system);
  return Number(u.fromSi(si).toFixed(u.decimals));
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
