import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BrewingInputError } from './errors';
import {
  abv,
  abvBalling,
  abvHall,
  abvSimple,
  ABV_METHOD_SHOWN,
  apparentAttenuation,
  extractPctToPpg,
  fgFromAttenuation,
  gravityPoints,
  ogFromFermentables,
  platoToSg,
  realAttenuation,
  realExtractPlato,
  sgToPlato,
  SUCROSE_PPG,
} from './gravity';
import { expectInputError } from './test-helpers';
import { lbToKg, usGalToL } from '../quantities/convert';

describe('SG ↔ °Plato', () => {
  it('matches the ASBC extract table (values from memory)', () => {
    // ASBC extract table (from memory): 1.040 ≈ 10.0 °P, 1.060 ≈ 14.7 °P, 1.080 ≈ 19.3 °P, 1.100 ≈ 23.8 °P.
    expect(sgToPlato(1.04)).toBeCloseTo(10.0, 1);
    expect(sgToPlato(1.06)).toBeCloseTo(14.7, 1);
    expect(sgToPlato(1.08)).toBeCloseTo(19.3, 1);
    expect(sgToPlato(1.1)).toBeCloseTo(23.8, 1);
    expect(sgToPlato(1.0)).toBeCloseTo(0, 1);
  });

  it('inverts the same polynomial exactly and agrees with the closed-form approximation', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.98, max: 1.2, noNaN: true }), (sg) => {
        expect(platoToSg(sgToPlato(sg))).toBeCloseTo(sg, 10);
      }),
    );
    // Closed form SG = 1 + P/(258.6 − (P/258.2)·227.1), a common published approximation.
    for (const p of [5, 10, 15, 20, 25]) {
      expect(Math.abs(platoToSg(p) - (1 + p / (258.6 - (p / 258.2) * 227.1)))).toBeLessThan(0.0006);
    }
  });

  it('rejects gravities outside 0.980–1.200 with a typed error', () => {
    expect(() => sgToPlato(1.3)).toThrow(BrewingInputError);
    expect(() => sgToPlato(Number.NaN)).toThrow(BrewingInputError);
    expectInputError(() => gravityPoints(0.9, 'og'), 'og');
  });
});

describe('OG from fermentables', () => {
  it('follows the extract-potential method (hand-worked: 10 lb × 37 PPG × 75 % / 5 gal = 55.5 points)', () => {
    const og = ogFromFermentables([{ weightKg: lbToKg(10), potential: { ppg: 37 }, stage: 'mash' }], 0.75, usGalToL(5));
    expect(og).toBeCloseTo(1.0555, 10);
  });

  it('counts kettle sugar at 100 % (hand-worked: 1 lb × 46 PPG / 5 gal = 9.2 points)', () => {
    const og = ogFromFermentables([{ weightKg: lbToKg(1), potential: { ppg: 46 }, stage: 'kettle' }], 0.5, usGalToL(5));
    expect(og).toBeCloseTo(1.0092, 10);
  });

  it('derives sucrose at ≈ 46 PPG (common practice, no source: "sucrose is 46 PPG")', () => {
    expect(SUCROSE_PPG).toBeGreaterThan(45.8);
    expect(SUCROSE_PPG).toBeLessThan(46.5);
    expect(extractPctToPpg(80)).toBeCloseTo(0.8 * SUCROSE_PPG, 10);
  });

  it('rejects negative weights, zero volume and bad efficiency', () => {
    const item = { weightKg: 1, potential: { ppg: 37 }, stage: 'mash' as const };
    expect(() => ogFromFermentables([{ ...item, weightKg: -1 }], 0.7, 20)).toThrow(BrewingInputError);
    expect(() => ogFromFermentables([item], 0.7, 0)).toThrow(BrewingInputError);
    expect(() => ogFromFermentables([item], 0, 20)).toThrow(BrewingInputError);
    expect(() => ogFromFermentables([item], 1.01, 20)).toThrow(BrewingInputError);
    expect(() => ogFromFermentables([{ ...item, weightKg: 100 }], 0.7, 20)).toThrow(BrewingInputError);
  });
});

describe('attenuation and ABV', () => {
  it('FG from apparent attenuation (hand-worked: 1.050 at 80 % → 1.010)', () => {
    expect(fgFromAttenuation(1.05, 80)).toBeCloseTo(1.01, 12);
    expect(apparentAttenuation(1.05, 1.01)).toBeCloseTo(0.8, 12);
  });

  it('simple rule: (OG − FG) × 131.25 (common practice)', () => {
    expect(abvSimple(1.05, 1.01)).toBeCloseTo(5.25, 10);
  });

  it('Hall formula, hand-worked from the published formula: 1.050/1.010 → 5.34 %', () => {
    // 76.08 × 0.040 / 0.725 = 4.1975; × 1.010 / 0.794 = 5.339 (no published worked example recalled).
    expect(abvHall(1.05, 1.01)).toBeCloseTo(5.339, 3);
  });

  it('Balling route: real extract, ABW and ABV (hand-worked from Balling via Hall, Zymurgy 1995)', () => {
    // OE = 12.39 °P, AE = 2.56 °P → RE = 0.1808·12.39 + 0.8192·2.56 = 4.34 °P;
    // ABW = (12.39 − 4.34)/(2.0665 − 0.010665·12.39) = 4.16 %; ABV = 4.16 × 1.010/0.794 = 5.29 %.
    expect(realExtractPlato(1.05, 1.01)).toBeCloseTo(4.34, 2);
    expect(abvBalling(1.05, 1.01)).toBeCloseTo(5.29, 2);
    expect(abv(1.05, 1.01)).toBe(abv(1.05, 1.01, ABV_METHOD_SHOWN));
  });

  it('real attenuation is 0.8192 × apparent attenuation in °P (identity of the Balling relation)', () => {
    const oe = sgToPlato(1.06);
    const ae = sgToPlato(1.012);
    expect(realAttenuation(1.06, 1.012)).toBeCloseTo((0.8192 * (oe - ae)) / oe, 12);
  });

  it('ABV ≥ 0 whenever OG ≥ FG, for every method', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.98, max: 1.2, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (og, t) => {
          const fg = 0.98 + (og - 0.98) * t;
          for (const method of ['simple', 'balling', 'hall'] as const) {
            const value = abv(og, fg, method);
            expect(Number.isFinite(value)).toBe(true);
            expect(value).toBeGreaterThanOrEqual(-1e-9);
          }
        },
      ),
    );
  });

  it('rejects FG above OG and OG of 1.000 for attenuation', () => {
    expect(() => abv(1.01, 1.02)).toThrow(BrewingInputError);
    expect(() => apparentAttenuation(1.0, 1.0)).toThrow(BrewingInputError);
    expect(() => fgFromAttenuation(1.05, 120)).toThrow(BrewingInputError);
  });
});
