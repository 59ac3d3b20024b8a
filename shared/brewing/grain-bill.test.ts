import { describe, expect, it } from 'vitest';
import { BrewingInputError } from './errors';
import { percentagesFromWeights, weightsForTargetOg } from './grain-bill';
import { ogFromFermentables } from './gravity';
import { kgToLb, usGalToL } from '../quantities/convert';

const bill = [
  { percent: 85, potential: { ppg: 37 }, stage: 'mash' as const },
  { percent: 10, potential: { ppg: 34 }, stage: 'mash' as const },
  { percent: 5, potential: { extractPct: 100 }, stage: 'kettle' as const },
];

describe('weights for a target OG', () => {
  it('hits the OG (hand-worked: 100 % 37 PPG at 75 % for 1.0555 in 5 gal → 10 lb)', () => {
    const [kg] = weightsForTargetOg(
      [{ percent: 100, potential: { ppg: 37 }, stage: 'mash' }],
      1.0555,
      0.75,
      usGalToL(5),
    );
    expect(kgToLb(kg!)).toBeCloseTo(10, 10);
  });

  it('keeps the percentages and reproduces the OG, sugar at 100 %', () => {
    const weights = weightsForTargetOg(bill, 1.062, 0.7, 40);
    const items = bill.map((b, i) => ({ ...b, weightKg: weights[i]! }));
    expect(ogFromFermentables(items, 0.7, 40)).toBeCloseTo(1.062, 12);
    percentagesFromWeights(weights).forEach((p, i) => expect(p).toBeCloseTo(bill[i]!.percent, 10));
  });

  it('needs less grain at higher efficiency, but the same sugar share', () => {
    const low = weightsForTargetOg(bill, 1.062, 0.65, 40);
    const high = weightsForTargetOg(bill, 1.062, 0.85, 40);
    expect(high[0]!).toBeLessThan(low[0]!);
  });

  it('rejects percentages that do not sum to 100 and a zero volume', () => {
    expect(() => weightsForTargetOg([{ ...bill[0]!, percent: 90 }], 1.05, 0.7, 20)).toThrow(BrewingInputError);
    expect(() => weightsForTargetOg(bill, 1.05, 0.7, 0)).toThrow(BrewingInputError);
    expect(() => percentagesFromWeights([0, 0])).toThrow(BrewingInputError);
    expect(() => percentagesFromWeights([1, -2])).toThrow(BrewingInputError);
  });

  it('turns weights into percentages', () => {
    expect(percentagesFromWeights([3, 1])).toEqual([75, 25]);
  });
});
