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
    expect(dRestTriggerSg(1.012, 3)).toBe(1.015);
    expectInputError(() => dRestTriggerSg(1.012, -1), 'dRestPoints');
  });

  it('rounds the trigger once, to the point, so the trigger shown is the trigger used', () => {
    // A planned FG typed as 3.07 °P is SG 1.01196…: the trigger is shown as 1.015 and must be 1.015.
    const trigger = dRestTriggerSg(1.01196, 3);
    expect(trigger).toBe(1.015);
    expect(trigger.toFixed(3)).toBe('1.015');
    expect(crossesDRestTrigger(1.016, 1.015, trigger)).toBe(true);
    expect(dRestTriggerSg(1.0124, 3)).toBe(1.015);
    expect(dRestTriggerSg(1.0126, 3)).toBe(1.016);
  });

  it('fires on the first reading at or below the trigger only, comparing readings as shown', () => {
    expect(crossesDRestTrigger(1.02, 1.015, 1.015)).toBe(true);
    expect(crossesDRestTrigger(null, 1.014, 1.015)).toBe(true);
    expect(crossesDRestTrigger(1.016, 1.0155, 1.015)).toBe(false);
    expect(crossesDRestTrigger(1.014, 1.013, 1.015)).toBe(false);
    // 1.01504 is shown as 1.015: it has reached a trigger shown as 1.015
    expect(crossesDRestTrigger(1.016, 1.01504, 1.015)).toBe(true);
  });

  describe('a stall: no fall of more than 1 point over at least 24 hours (common practice, no source)', () => {
    const hour = 3_600_000;
    const series = (everyHours: number, hours: number, sgAt: (h: number) => number) =>
      Array.from({ length: Math.floor(hours / everyHours) + 1 }, (_, i) => ({
        atMs: start + i * everyHours * hour,
        sg: sgAt(i * everyHours),
      }));

    it('dense probe data of an active fermentation never stalls, even where three readings in a row agree', () => {
      // Every 30 minutes for three days, falling 6 points a day, with the probe's ±0.2 point jitter.
      const probe = series(0.5, 72, (h) => 1.05 - (6 * h) / 24 / 1000 + (h % 2 === 0 ? 0.0002 : -0.0002));
      const lastThree = probe.slice(-3).map((p) => p.sg);
      expect(Math.max(...lastThree) - Math.min(...lastThree)).toBeLessThan(0.001); // the old rule's stall
      for (let i = 1; i <= probe.length; i += 1) expect(gravityStalled(probe.slice(0, i), 1.015)).toBe(false);
    });

    it('a genuine stall: daily readings or probe data flat for a day, above the trigger', () => {
      expect(
        gravityStalled(
          series(24, 48, (h) => 1.04 - (5 * h) / 24 / 1000),
          1.015,
        ),
      ).toBe(false);
      expect(
        gravityStalled(
          series(24, 72, (h) => (h < 24 ? 1.04 : 1.03)),
          1.015,
        ),
      ).toBe(true);
      const stuckProbe = series(0.5, 48, (h) => (h < 20 ? 1.05 - h / 1000 : 1.03 - 0.0001 * ((h * 2) % 3)));
      expect(gravityStalled(stuckProbe, 1.015)).toBe(true);
      // a fall of exactly one point in a day is no fall worth the name; two points is
      expect(
        gravityStalled(
          series(24, 24, (h) => 1.03 - h / 24 / 1000),
          1.015,
        ),
      ).toBe(true);
      expect(
        gravityStalled(
          series(24, 24, (h) => 1.03 - (2 * h) / 24 / 1000),
          1.015,
        ),
      ).toBe(false);
    });

    it('judges nothing before a full day of readings, nor a beer at or below the trigger', () => {
      expect(
        gravityStalled(
          series(0.5, 23.5, () => 1.03),
          1.015,
        ),
      ).toBe(false);
      expect(gravityStalled([], 1.015)).toBe(false);
      // at the end of fermentation, gravity standing still is what should happen
      expect(
        gravityStalled(
          series(24, 72, () => 1.012),
          1.015,
        ),
      ).toBe(false);
    });
  });

  it('a reading is overdue after the set interval', () => {
    expect(readingOverdue(start, start + 25 * 3_600_000, 24)).toBe(true);
    expect(readingOverdue(start, start + 23 * 3_600_000, 24)).toBe(false);
    expectInputError(() => readingOverdue(start, start, 0), 'readingIntervalHours');
  });
});
