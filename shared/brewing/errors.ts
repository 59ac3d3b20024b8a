/**
 * One error type for impossible input, so the API can map it to a 422 with the
 * offending field, and the UI can put the message beside that field. Functions
 * here throw rather than return NaN, Infinity or a silently clamped value.
 */
import { QUANTITIES } from '../quantities';

export class BrewingInputError extends Error {
  /** Dotted path of the offending input, e.g. `grainBill.items.2.weightKg`. */
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = 'BrewingInputError';
    this.field = field;
  }
}

/** Lowest and highest specific gravity the formulas are trusted for (the quantities table's gravity limits). */
export const MIN_SG = QUANTITIES.gravity.min;
export const MAX_SG = QUANTITIES.gravity.max;
/** Highest alpha acid % accepted (no commercial hop is near it; a typo guard). */
export const MAX_ALPHA_ACID_PCT = QUANTITIES.alphaAcid.max;
/** How far fermentable percentages may miss 100 % (rounding in hand-written recipes). */
export const PERCENT_SUM_TOLERANCE = 0.5;

function show(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(6))) : String(value);
}

/** Throws unless `value` is a finite number. */
export function requireFinite(value: number, field: string, label = field): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new BrewingInputError(field, `${label} must be a number (got ${String(value)}).`);
  }
  return value;
}

/** Throws unless `value` is finite and > 0. */
export function requirePositive(value: number, field: string, label = field): number {
  requireFinite(value, field, label);
  if (value <= 0) throw new BrewingInputError(field, `${label} must be greater than zero (got ${show(value)}).`);
  return value;
}

/** Throws unless `value` is finite and ≥ 0. */
export function requireNonNegative(value: number, field: string, label = field): number {
  requireFinite(value, field, label);
  if (value < 0) throw new BrewingInputError(field, `${label} cannot be negative (got ${show(value)}).`);
  return value;
}

/** Throws unless min ≤ value ≤ max (or min < value when `minExclusive`). */
export function requireInRange(
  value: number,
  field: string,
  min: number,
  max: number,
  label = field,
  minExclusive = false,
): number {
  requireFinite(value, field, label);
  const belowMin = minExclusive ? value <= min : value < min;
  if (belowMin || value > max) {
    const lower = minExclusive ? `above ${show(min)}` : `at least ${show(min)}`;
    throw new BrewingInputError(field, `${label} must be ${lower} and at most ${show(max)} (got ${show(value)}).`);
  }
  return value;
}

/** Throws unless `sg` is a specific gravity within 0.980–1.200. */
export function requireGravity(sg: number, field: string, label = 'Specific gravity'): number {
  return requireInRange(sg, field, MIN_SG, MAX_SG, label);
}

/** Throws unless `efficiency` is a fraction in (0, 1]. */
export function requireEfficiency(efficiency: number, field: string, label = 'Efficiency'): number {
  return requireInRange(efficiency, field, 0, 1, `${label} (a fraction, e.g. 0.72)`, true);
}

/** Throws unless `pct` is an alpha acid percentage in (0, 30]. */
export function requireAlphaAcid(pct: number, field: string): number {
  return requireInRange(pct, field, 0, MAX_ALPHA_ACID_PCT, 'Alpha acid %', true);
}

/** Throws unless the percentages are each ≥ 0 and sum to 100 within {@link PERCENT_SUM_TOLERANCE}. */
export function requirePercentSum(percents: readonly number[], field: string): void {
  if (percents.length === 0) throw new BrewingInputError(field, 'At least one item is needed.');
  let sum = 0;
  percents.forEach((p, i) => {
    sum += requireNonNegative(p, `${field}.${i}.percent`, 'Percentage');
  });
  if (Math.abs(sum - 100) > PERCENT_SUM_TOLERANCE) {
    throw new BrewingInputError(field, `Percentages must add up to 100 % (they add up to ${show(sum)} %).`);
  }
}
