import { describe, expect, it } from 'vitest';
import {
  MEASURING_TOLERANCE,
  convertDoseRule,
  convertPractical,
  doseRangeLabel,
  doseAmount,
  doseLevelFromAmount,
  doseRange,
  roundForMeasuring,
  scaleDose,
} from './adjuncts';
import { EXAMPLE_IPA, PILOT_SYSTEM } from './example-recipes';
import { computeRecipe } from './recipe';
import { expectInputError } from './test-helpers';
import { kgToLb, lbToKg, mlToTsp, ozToG, tspToMl, usBblToL, usGalToL } from '../quantities/convert';

describe('dose rules', () => {
  it('3–5 lb of fruit per US gal scaled to a 3.5 bbl batch → 325.5–542.5 lb (common practice, no source)', () => {
    const { low, high } = doseRange({ basis: 'lbPerUsGal', low: 3, high: 5 }, usBblToL(3.5));
    expect(low.unit).toBe('kg');
    expect(kgToLb(low.value)).toBeCloseTo(325.5, 6);
    expect(kgToLb(high.value)).toBeCloseTo(542.5, 6);
  });

  it('3–5 tsp cinnamon per 5 gal scales linearly: 10 gal → 6–10 tsp (common practice, no source)', () => {
    const { low, high } = doseRange({ basis: 'tspPer5UsGal', low: 3, high: 5 }, usGalToL(10));
    expect(low.unit).toBe('mL');
    expect(mlToTsp(low.value)).toBeCloseTo(6, 10);
    expect(mlToTsp(high.value)).toBeCloseTo(10, 10);
  });

  it('kg per hL and g per L', () => {
    expect(doseAmount({ basis: 'kgPerHl', low: 0, high: 2 }, 1, 1000).value).toBeCloseTo(10, 10);
    expect(doseAmount({ basis: 'gPerL', low: 0, high: 5 }, 2, 50).value).toBeCloseTo(0.1, 10);
    expect(doseAmount({ basis: 'gPerHl', low: 0, high: 50 }, 30, 200).value).toBeCloseTo(0.06, 10);
  });

  it('fixed per batch does not scale', () => {
    const rule = { basis: 'fixedPerBatch' as const, low: 1, high: 3, fixedUnit: 'each' as const };
    const { from, to } = scaleDose(rule, 2, 20, 2000);
    expect(from).toEqual({ value: 2, unit: 'each' });
    expect(to).toEqual({ value: 2, unit: 'each' });
  });

  it('scales per-volume doses in proportion and inverts', () => {
    const rule = { basis: 'ozPerUsGal' as const, low: 1, high: 4 };
    const { from, to } = scaleDose(rule, 2, 20, 80);
    expect(to.value / from.value).toBeCloseTo(4, 12);
    expect(doseLevelFromAmount(rule, to, 80)).toBeCloseTo(2, 12);
  });

  it('rejects an upside-down range and negative doses', () => {
    expectInputError(() => doseAmount({ basis: 'gPerL', low: 5, high: 1 }, 2, 10), 'rule.high');
    expectInputError(() => doseAmount({ basis: 'gPerL', low: 0, high: 1 }, -2, 10), 'level');
    expectInputError(() => doseAmount({ basis: 'gPerL', low: 0, high: 1 }, 1, 0), 'volumeL');
  });
});

describe('practical conversions and rounding', () => {
  it('2 cinnamon sticks ≈ 1 tsp ground (common practice, no source), both ways', () => {
    expect(convertPractical(2, 'cinnamon stick', 'tsp ground cinnamon')).toBeCloseTo(1, 12);
    expect(convertPractical(1, 'tsp ground cinnamon', 'cinnamon stick')).toBeCloseTo(2, 12);
    expect(convertPractical(2, 'tbsp', 'tsp')).toBe(6);
    expectInputError(() => convertPractical(1, 'tbsp', 'cinnamon stick'), 'to');
  });

  it('rounds to what a brewer can weigh or measure (steps documented in roundForMeasuring)', () => {
    expect(roundForMeasuring({ value: 0.123, unit: 'kg' }, 'metric')).toEqual({ value: 125, unit: 'g' });
    expect(roundForMeasuring({ value: 0.0123, unit: 'kg' }, 'metric')).toEqual({ value: 12, unit: 'g' });
    expect(roundForMeasuring({ value: 147.64, unit: 'kg' }, 'metric')).toEqual({ value: 147.5, unit: 'kg' });
    expect(roundForMeasuring({ value: 1.2, unit: 'kg' }, 'us')).toEqual({ value: 2.75, unit: 'lb' });
    expect(roundForMeasuring({ value: 0.05, unit: 'kg' }, 'us')).toEqual({ value: 1.75, unit: 'oz' });
    // 10.5 mL = 2.13 tsp: 2.25 would be 5.6 % over, so the ⅛ tsp spoon is used.
    expect(roundForMeasuring({ value: 10.5, unit: 'mL' }, 'us')).toEqual({ value: 2.125, unit: 'tsp' });
    expect(roundForMeasuring({ value: 1.3, unit: 'each' }, 'us')).toEqual({ value: 1.25, unit: 'each' });
    // 1.1 lb: a quarter-pound step would say 1 lb (9 % short); a tenth of a pound is within 5 %.
    expect(roundForMeasuring({ value: lbToKg(1.1), unit: 'kg' }, 'us')).toEqual({ value: 1.1, unit: 'lb' });
  });

  it('coriander at 5 g per hL for a 10 US gal pilot batch is 1.9 g, in grams on a US sheet too', () => {
    // 10 US gal = 37.854 L (NIST Handbook 44 Appendix C: 1 gal = 3.785411784 L); 5 g/hL × 0.37854 hL = 1.893 g.
    const amount = doseAmount({ basis: 'gPerHl', low: 0.5, high: 8 }, 5, usGalToL(10));
    expect(amount.value * 1000).toBeCloseTo(1.893, 3);
    expect(roundForMeasuring(amount, 'us')).toEqual({ value: 1.9, unit: 'g' });
    expect(roundForMeasuring(amount, 'metric')).toEqual({ value: 1.9, unit: 'g' });
  });

  it(`never changes an amount by more than ${MEASURING_TOLERANCE * 100} % (our bound), from a pinch to a pallet`, () => {
    for (const system of ['us', 'metric'] as const) {
      for (let exp = -7; exp <= 3; exp += 0.037) {
        const kg = 10 ** exp;
        const m = roundForMeasuring({ value: kg, unit: 'kg' }, system);
        const backKg =
          m.unit === 'g'
            ? m.value / 1000
            : m.unit === 'oz'
              ? ozToG(m.value) / 1000
              : m.unit === 'lb'
                ? lbToKg(m.value)
                : m.value;
        expect(Math.abs(backKg - kg) / kg).toBeLessThanOrEqual(MEASURING_TOLERANCE + 1e-9);
        const ml = 10 ** (exp + 3);
        const v = roundForMeasuring({ value: ml, unit: 'mL' }, system);
        const backMl = v.unit === 'tsp' ? tspToMl(v.value) : v.value;
        expect(Math.abs(backMl - ml) / ml).toBeLessThanOrEqual(MEASURING_TOLERANCE + 1e-9);
      }
    }
  });

  it('never rounds a non-zero amount to nothing', () => {
    expect(roundForMeasuring({ value: 0.1, unit: 'mL' }, 'us')).toEqual({ value: 0.1, unit: 'mL' });
    expect(roundForMeasuring({ value: 0.0000012, unit: 'kg' }, 'us')).toEqual({ value: 0.0012, unit: 'g' });
    expect(roundForMeasuring({ value: 0, unit: 'kg' }, 'metric')).toEqual({ value: 0, unit: 'g' });
  });
});

describe('dose units when the basis changes', () => {
  it('restates 0.5–2 oz per US gal as g per hL: 1 oz/gal = 749 g/hL (NIST Handbook 44 Appendix C: 1 oz = 28.349523 g, 1 gal = 3.785411784 L)', () => {
    const converted = convertDoseRule({ basis: 'ozPerUsGal', low: 0.5, high: 2 }, 1, 'gPerHl', usGalToL(10))!;
    expect(converted.rule.basis).toBe('gPerHl');
    expect(converted.level).toBeCloseTo(748.9, 1);
    expect(converted.rule.low).toBeCloseTo(374.5, 1);
    expect(converted.rule.high).toBeCloseTo(1497.8, 1);
    // Same absolute amount in the batch either way.
    expect(doseAmount(converted.rule, converted.level, 50).value).toBeCloseTo(
      doseAmount({ basis: 'ozPerUsGal', low: 0.5, high: 2 }, 1, 50).value,
      10,
    );
  });

  it('restates a per-volume dose per batch at the batch volume, and refuses weight to volume', () => {
    const perBatch = convertDoseRule({ basis: 'kgPerHl', low: 1, high: 2 }, 1.5, 'fixedPerBatch', 200)!;
    expect(perBatch.rule).toEqual({ basis: 'fixedPerBatch', low: 2, high: 4, fixedUnit: 'kg' });
    expect(perBatch.level).toBeCloseTo(3, 12);
    expect(convertDoseRule({ basis: 'gPerHl', low: 1, high: 2 }, 1, 'tspPer5UsGal', 100)).toBeUndefined();
  });

  it('states the unit in the range and in the out-of-range warning', () => {
    expect(doseRangeLabel({ basis: 'gPerHl', low: 0.5, high: 2 })).toBe('0.5–2 g per hL');
    expect(doseRangeLabel({ basis: 'fixedPerBatch', low: 1, high: 3, fixedUnit: 'each' })).toBe('1–3 each per batch');
    const recipe = {
      ...EXAMPLE_IPA,
      adjuncts: [
        {
          name: 'Coriander',
          category: 'spice' as const,
          stage: 'boil' as const,
          boilMinutes: 5,
          rule: { basis: 'gPerHl' as const, low: 0.5, high: 2 },
          level: 5,
        },
      ],
    };
    const warning = computeRecipe(recipe, PILOT_SYSTEM).warnings.find((w) => w.code === 'adjunctOutsideRange')!;
    expect(warning.message).toBe('Coriander: the dose of 5 g per hL is outside its 0.5–2 g per hL range.');
  });
});
