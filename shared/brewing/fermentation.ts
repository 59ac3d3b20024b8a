/**
 * Fermentation in the cellar: the gravity curve and what it predicts, the
 * refractometer's wort correction, and the rules that raise cellar alerts.
 * Gravity as SG, time in milliseconds since the epoch, temperatures in °C.
 */
import { BrewingInputError, requireGravity, requireInRange, requirePositive } from './errors';
import { platoToSg } from './gravity';

/** One gravity reading on the curve. */
export interface GravityPoint {
  /** When the sample was taken, ms since the epoch. */
  atMs: number;
  sg: number;
}

/** A curve fitted to the readings so far. It is a prediction, not a measurement. */
export interface FermentationPrediction {
  /** Gravity the curve levels off at, SG. */
  predictedFg: number;
  /** When the curve comes within {@link SETTLED_POINTS} of that gravity, ms since the epoch. */
  predictedAtMs: number;
  /** First-order rate, per day. */
  ratePerDay: number;
  /** Gravity on the fitted curve at a time, SG. */
  at: (atMs: number) => number;
  /** When the fitted curve falls to `sg`, ms since the epoch; null if it never does (at or below the predicted FG). */
  reaches: (sg: number) => number | null;
}

const MS_PER_DAY = 86_400_000;
/** "Finished" for the predicted date: within half a gravity point of the levelling-off value (common practice, no source). */
export const SETTLED_POINTS = 0.5;
/** Rates searched, per day: from a very slow lager to a very fast ale. */
const MIN_RATE_PER_DAY = 0.02;
const MAX_RATE_PER_DAY = 10;

function linearFit(xs: number[], ys: number[]): { a: number; b: number; sse: number } {
  const n = xs.length;
  const mx = xs.reduce((s, x) => s + x, 0) / n;
  const my = ys.reduce((s, y) => s + y, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (xs[i]! - mx) ** 2;
    sxy += (xs[i]! - mx) * (ys[i]! - my);
  }
  const b = sxx === 0 ? 0 : sxy / sxx;
  const a = my - b * mx;
  const sse = xs.reduce((s, x, i) => s + (a + b * x - ys[i]!) ** 2, 0);
  return { a, b, sse };
}

/**
 * Fits the readings to the first-order decay SG(t) = FG + (SG₀ − FG)·e^(−k·t)
 * (the usual way to model apparent extract falling during fermentation:
 * sugar uptake proportional to the sugar left) and predicts the gravity it
 * levels off at and when. For each rate k the model is linear in FG and the
 * amplitude, so those come from least squares; k is found by a golden-section
 * search on log k. Returns null when the readings cannot support a prediction:
 * fewer than three, all at one time, or not falling.
 */
export function predictFermentation(points: readonly GravityPoint[]): FermentationPrediction | null {
  points.forEach((p, i) => requireGravity(p.sg, `points.${i}.sg`));
  const sorted = [...points].sort((a, b) => a.atMs - b.atMs);
  if (sorted.length < 3) return null;
  const t0 = sorted[0]!.atMs;
  const days = sorted.map((p) => (p.atMs - t0) / MS_PER_DAY);
  const sgs = sorted.map((p) => p.sg);
  if (days[days.length - 1]! <= 0) return null;
  const last = sgs[sgs.length - 1]!;
  if (sgs[0]! - last < 0.001) return null; // under a point of movement: nothing to extrapolate

  const fitAt = (k: number) =>
    linearFit(
      days.map((d) => Math.exp(-k * d)),
      sgs,
    );
  let lo = Math.log(MIN_RATE_PER_DAY);
  let hi = Math.log(MAX_RATE_PER_DAY);
  const golden = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - golden * (hi - lo);
  let x2 = lo + golden * (hi - lo);
  let f1 = fitAt(Math.exp(x1)).sse;
  let f2 = fitAt(Math.exp(x2)).sse;
  for (let i = 0; i < 80; i++) {
    if (f1 < f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - golden * (hi - lo);
      f1 = fitAt(Math.exp(x1)).sse;
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + golden * (hi - lo);
      f2 = fitAt(Math.exp(x2)).sse;
    }
  }
  const k = Math.exp((lo + hi) / 2);
  const { a: fg, b: amplitude } = fitAt(k);
  // A rising or flat curve, or one levelling off below water, predicts nothing useful.
  if (amplitude <= 0 || fg < 0.99 || fg > last) return null;
  const settledDays = Math.max(0, Math.log(amplitude / (SETTLED_POINTS / 1000)) / k);
  return {
    predictedFg: fg,
    predictedAtMs: t0 + settledDays * MS_PER_DAY,
    ratePerDay: k,
    at: (atMs: number) => fg + amplitude * Math.exp((-k * (atMs - t0)) / MS_PER_DAY),
    reaches: (sg: number) => (sg <= fg ? null : t0 + (Math.max(0, Math.log(amplitude / (sg - fg))) / k) * MS_PER_DAY),
  };
}

/** Gravity to the thousandth (one gravity point), as the trade reads and writes a specific gravity. */
export const roundSg = (sg: number): number => Math.round(sg * 1000) / 1000;

/**
 * The gravity at which the D-rest starts: planned FG plus the trigger in gravity points, rounded once to
 * the point here, so the trigger every screen shows is the very number the alert compares readings with.
 */
export function dRestTriggerSg(plannedFg: number, triggerPoints: number): number {
  requireGravity(plannedFg, 'plannedFg', 'Planned FG');
  requireInRange(triggerPoints, 'dRestPoints', 0, 20, 'D-rest trigger (gravity points)');
  return roundSg(plannedFg + triggerPoints / 1000);
}

/** Wort correction factor most brewers use for a sucrose-scale refractometer (common practice, no source). */
export const DEFAULT_WORT_CORRECTION = 1.04;

function requireBrix(brix: number, field: string): number {
  return requireInRange(brix, field, 0, 40, 'Refractometer reading (°Brix)');
}

function requireWortCorrection(wcf: number): number {
  return requireInRange(wcf, 'wortCorrection', 0.9, 1.2, 'Wort correction factor');
}

/**
 * Unfermented wort from a refractometer: °Brix ÷ wort correction factor is
 * taken as °Plato (Brix and Plato are both % sucrose by weight), then → SG.
 */
export function refractometerWortSg(brix: number, wortCorrection = DEFAULT_WORT_CORRECTION): number {
  return platoToSg(requireBrix(brix, 'brix') / requireWortCorrection(wortCorrection), 'brix');
}

/**
 * Fermenting beer from a refractometer: alcohol bends the reading, so the
 * original and current readings (both wort-corrected °Brix) go into Sean
 * Terrill's cubic fit, "Refractometer FG Results", seanterrill.com, 2011:
 * SG = 1 − 0.0044993·Bi + 0.011774·Bf + 0.00027581·Bi² − 0.0012717·Bf² − 0.0000072800·Bi³ + 0.000063293·Bf³
 * (coefficients from memory). Raw readings in, corrected here.
 */
export function refractometerBeerSg(
  originalBrix: number,
  currentBrix: number,
  wortCorrection = DEFAULT_WORT_CORRECTION,
): number {
  requireBrix(originalBrix, 'originalBrix');
  requireBrix(currentBrix, 'brix');
  if (currentBrix > originalBrix)
    throw new BrewingInputError('brix', 'The current reading cannot be higher than the original reading.');
  const wcf = requireWortCorrection(wortCorrection);
  const bi = originalBrix / wcf;
  const bf = currentBrix / wcf;
  const sg =
    1 -
    0.0044993 * bi +
    0.011774 * bf +
    0.00027581 * bi ** 2 -
    0.0012717 * bf ** 2 -
    0.00000728 * bi ** 3 +
    0.000063293 * bf ** 3;
  return requireGravity(sg, 'brix');
}

/**
 * A refractometer reading as SG: unfermented wort when there is no original reading to correct for
 * alcohol (refractometerWortSg), fermenting beer when there is (refractometerBeerSg).
 */
export function refractometerSg(brix: number, originalBrix?: number, wortCorrection?: number): number {
  return originalBrix === undefined
    ? refractometerWortSg(brix, wortCorrection)
    : refractometerBeerSg(originalBrix, brix, wortCorrection);
}

// ----------------------------------------------------------------- alert rules

/**
 * True when this reading is the first at or below the D-rest trigger. Readings are compared as they are
 * shown, to the point: a reading shown as 1.015 has reached a trigger shown as 1.015.
 */
export function crossesDRestTrigger(previousSg: number | null, currentSg: number, triggerSg: number): boolean {
  const reached = (sg: number) => roundSg(sg) <= roundSg(triggerSg);
  return reached(currentSg) && (previousSg === null || !reached(previousSg));
}

/**
 * A stall is measured in time, not in readings, so a probe logging every half hour and a hydrometer read
 * once a day judge alike: gravity that has fallen no more than {@link STALL_MAX_FALL_POINTS} over at least
 * {@link STALL_WINDOW_HOURS}. An active ale or lager fermentation drops several points a day, so one point
 * in a full day means the yeast has stopped (common practice, no source).
 */
export const STALL_MAX_FALL_POINTS = 1;
export const STALL_WINDOW_HOURS = 24;

/**
 * True when the beer, still above the D-rest trigger, has fallen no more than STALL_MAX_FALL_POINTS
 * between the last reading and the latest reading taken at least STALL_WINDOW_HOURS before it
 * (readings oldest first). Fewer hours of readings than the window judge nothing yet.
 */
export function gravityStalled(readings: readonly GravityPoint[], triggerSg: number): boolean {
  const last = readings[readings.length - 1];
  if (!last || roundSg(last.sg) <= roundSg(triggerSg)) return false;
  const windowStart = last.atMs - STALL_WINDOW_HOURS * 3_600_000;
  const reference = readings.findLast((r) => r.atMs <= windowStart);
  if (!reference) return false;
  return roundSg(reference.sg) - roundSg(last.sg) <= STALL_MAX_FALL_POINTS / 1000 + 1e-9;
}

/** True when more than `maxGapHours` have passed since the last reading (or since filling, when none yet). */
export function readingOverdue(lastAtMs: number, nowMs: number, maxGapHours: number): boolean {
  requirePositive(maxGapHours, 'readingIntervalHours', 'Reading interval (hours)');
  return nowMs - lastAtMs > maxGapHours * 3_600_000;
}
