import { describe, expect, it } from 'vitest';
import { achievedEfficiency } from './efficiency';
import { BrewingInputError } from './errors';

describe('brewhouse efficiency achieved', () => {
  it('scales the planned efficiency by extract delivered (Palmer, How to Brew, ch. 12: points × volume)', () => {
    // Hand-worked: plan 75 % for 1.050 × 20 L = 1000 point-litres; delivered 1.048 × 21 L = 1008 point-litres → 75.6 %.
    expect(
      achievedEfficiency({
        plannedEfficiency: 0.75,
        plannedOg: 1.05,
        plannedVolumeL: 20,
        actualOg: 1.048,
        actualVolumeL: 21,
      }),
    ).toBeCloseTo(0.756, 6);
  });

  it('equals the plan when the plan is met exactly', () => {
    expect(
      achievedEfficiency({
        plannedEfficiency: 0.82,
        plannedOg: 1.062,
        plannedVolumeL: 1173,
        actualOg: 1.062,
        actualVolumeL: 1173,
      }),
    ).toBeCloseTo(0.82, 12);
  });

  it('refuses impossible input with a typed error', () => {
    expect(() =>
      achievedEfficiency({
        plannedEfficiency: 0,
        plannedOg: 1.05,
        plannedVolumeL: 20,
        actualOg: 1.05,
        actualVolumeL: 20,
      }),
    ).toThrow(BrewingInputError);
    expect(() =>
      achievedEfficiency({
        plannedEfficiency: 0.7,
        plannedOg: 1.05,
        plannedVolumeL: 20,
        actualOg: 1.5,
        actualVolumeL: 20,
      }),
    ).toThrow(BrewingInputError);
  });
});
