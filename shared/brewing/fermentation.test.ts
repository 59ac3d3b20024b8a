import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  crossesDRestTrigger,
  dRestTriggerSg,
  gravityStalled,
  predictFermentation,
  readingOverdue,
  refractometerBeerSg,
  refractometerWortSg,
  refractometerSg,
} from './fermentation';
import { platoToSg } from './gravity';
import { expectInputError } from './test-helpers';

const DAY = 86_400_000;
const start = Date.UTC(2026, 10, 2, 9);

describe('predicting FG from the curve', () => {
  it('recovers FG and rate from readings that follow a first-order decay exactly (exact by construction)', () => {
    const fg = 1.011;
    const k = 0.55;
    const points = [0, 1, 2, 3, 4].map((d) => ({ atMs: start + d * DAY, sg: fg + (1.056 - fg) * Math.exp(-k * d) }));
    const p = predictFermentation(points)!;
    expect(p.predictedFg).toBeCloseTo(fg, 5);
    expect(p.ratePerDay).toBeCloseTo(k, 3);
    // within 0.5 point of FG when 0.045·e^(−k·t) = 0.0005 → t = ln(90)/k days
    expect((p.predictedAtMs - start) / DAY).toBeCloseTo(Math.log(90) / k, 2);
    expect(p.at(start + 2 * DAY)).toBeCloseTo(points[2]!.sg, 5);
    expect((p.reaches(fg + 0.045 * Math.exp(-k * 3))! - start) / DAY).toBeCloseTo(3, 2);
    expect(p.reaches(fg - 0.001)).toBeNull();
  });

  it('tolerates reading noise of ±0.5 point and still lands within a point of FG', () => {
    const noise = [0.0004, -0.0005, 0.0003, -0.0002, 0.0005, -0.0004, 0.0001];
    const points = noise.map((n, d) => ({ atMs: start + d * DAY, sg: 1.012 + 0.05 * Math.exp(-0.6 * d) + n }));
    expect(Math.abs(predictFermentation(points)!.predictedFg - 1.012)).toBeLessThan(0.001);
  });

  it('never predicts an FG above the latest reading, for any falling curve', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1.03, max: 1.1, noNaN: true }),
        fc.double({ min: 0.1, max: 3, noNaN: true }),
        fc.integer({ min: 3, max: 10 }),
        (og, k, n) => {
          const points = Array.from({ length: n }, (_, d) => ({
            atMs: start + d * DAY,
            sg: 1.01 + (og - 1.01) * Math.exp(-k * d),
          }));
          const p = predictFermentation(points);
          if (p) expect(p.predictedFg).toBeLessThanOrEqual(points[n - 1]!.sg + 1e-9);
        },
      ),
    );
  });

  it('makes no prediction from fewer than three readings or a curve that is not falling', () => {
    expect(
      predictFermentation([
        { atMs: start, sg: 1.05 },
        { atMs: start + DAY, sg: 1.04 },
      ]),
    ).toBeNull();
    expect(predictFermentation([0, 1, 2].map((d) => ({ atMs: start + d * DAY, sg: 1.05 })))).toBeNull();
    expect(predictFermentation([0, 1, 2].map((d) => ({ atMs: start + d * DAY, sg: 1.03 + d * 0.005 })))).toBeNull();
    expectInputError(() => predictFermentation([{ atMs: start, sg: 2 }]), 'points.0.sg');
  });
});

describe('refractometer', () => {
  it('wort: °Brix ÷ 1.04 read as °Plato (common practice, no source for 1.04)', () => {
    expect(refractometerWortSg(13.52)).toBeCloseTo(platoToSg(13), 10);
    expect(refractometerWortSg(13, 1)).toBeCloseTo(platoToSg(13), 10);
  });

  it("beer: Terrill's 2011 cubic (coefficients from memory) agrees within 3 points with the physical-model estimate SG = 0.00628·Bf − 0.0025·Bi + 1.0013 (woodlandbrew.com, 'Refractometer summary of equations', 2013)", () => {
    for (const [bi, bf] of [
      [12, 6],
      [16, 8],
      [20, 10],
    ] as const) {
      const terrill = refractometerBeerSg(bi * 1.04, bf * 1.04);
      const physical = 0.00628 * bf - 0.0025 * bi + 1.0013;
      expect(Math.abs(terrill - physical)).toBeLessThan(0.003);
    }
  });

  it('beer: lower current reading → lower gravity; refuses a current reading above the original', () => {
    expect(refractometerBeerSg(16, 7)).toBeLessThan(refractometerBeerSg(16, 8));
    expectInputError(() => refractometerBeerSg(10, 12), 'brix');
    expectInputError(() => refractometerBeerSg(16, 8, 2), 'wortCorrection');
  });

  it('a reading: wort without an original reading, beer (corrected for alcohol) with one', () => {
    expect(refractometerSg(13.52)).toBe(refractometerWortSg(13.52));
    expect(refractometerSg(8, 16, 1.02)).toBe(refractometerBeerSg(16, 8, 1.02));
  });
});

describe('alert rules', () => {
  it('the D-rest trigger is planned FG plus the trigger points (2–4 points is common practice, no source)', () => {
    expect(dRestTriggerSg(1.012, 3)).toBeCloseTo(1.015, 10);
    expectInputError(() => dRestTriggerSg(1.012, -1), 'dRestPoints');
  });

  it('fires on the first reading at or below the trigger only', () => {
    expect(crossesDRestTrigger(1.02, 1.015, 1.015)).toBe(true);
    expect(crossesDRestTrigger(null, 1.014, 1.015)).toBe(true);
    expect(crossesDRestTrigger(1.016, 1.0155, 1.015)).toBe(false);
    expect(crossesDRestTrigger(1.014, 1.013, 1.015)).toBe(false);
  });

  it('a stall is three readings within a point, above the trigger', () => {
    expect(gravityStalled([1.03, 1.0302, 1.0298], 1.015)).toBe(true);
    expect(gravityStalled([1.03, 1.028, 1.026], 1.015)).toBe(false);
    expect(gravityStalled([1.0302, 1.03], 1.015)).toBe(false);
    // at the end of fermentation, gravity standing still is what should happen
    expect(gravityStalled([1.012, 1.012, 1.012], 1.015)).toBe(false);
  });

  it('a reading is overdue after the set interval', () => {
    expect(readingOverdue(start, start + 25 * 3_600_000, 24)).toBe(true);
    expect(readingOverdue(start, start + 23 * 3_600_000, 24)).toBe(false);
    expectInputError(() => readingOverdue(start, start, 0), 'readingIntervalHours');
  });
});
