import { describe, expect, it } from 'vitest';
import { EXAMPLE_IPA, PILOT_SYSTEM, TEN_BBL_BREWHOUSE } from './example-recipes';
import { computeRecipe, hopWeightsForIbuShares } from './recipe';
import { expectInputError } from './test-helpers';

describe('hop weights from shares of the target IBU (Tinseth, inverted)', () => {
  // Two bittering additions written as 70 % and 20 % of 40 IBU; the rest keep their weights.
  const shares = [70, 20, undefined, undefined, undefined, undefined, undefined, undefined];

  for (const equipment of [PILOT_SYSTEM, TEN_BBL_BREWHOUSE]) {
    it(`gives each shared addition its share of the IBU on ${equipment.name}`, () => {
      const hops = hopWeightsForIbuShares(EXAMPLE_IPA, equipment, 40, shares);
      const result = computeRecipe({ ...EXAMPLE_IPA, hops }, equipment);
      // Round trip: ibuForAddition(hopWeightForIbu(x)) = x, so 28 and 8 IBU come back.
      expect(result.hops[0]!.ibu).toBeCloseTo(28, 9);
      expect(result.hops[1]!.ibu).toBeCloseTo(8, 9);
      expect(hops.slice(2)).toEqual(EXAMPLE_IPA.hops.slice(2));
    });
  }

  it('does not size shared additions in proportion to batch volume (boil gravity and efficiency differ)', () => {
    const pilot = hopWeightsForIbuShares(EXAMPLE_IPA, PILOT_SYSTEM, 40, shares)[0]!.weightG;
    const big = hopWeightsForIbuShares(EXAMPLE_IPA, TEN_BBL_BREWHOUSE, 40, shares)[0]!.weightG;
    expect(big / pilot).not.toBeCloseTo(TEN_BBL_BREWHOUSE.batchVolumeL / PILOT_SYSTEM.batchVolumeL, 2);
  });

  it('returns the hops untouched when no addition is written as a share', () => {
    expect(hopWeightsForIbuShares(EXAMPLE_IPA, PILOT_SYSTEM, 40, [])).toBe(EXAMPLE_IPA.hops);
  });

  it('refuses a share above 100 % and a share on an addition that cannot bitter', () => {
    expectInputError(() => hopWeightsForIbuShares(EXAMPLE_IPA, PILOT_SYSTEM, 40, [120]), 'hops.0.ibuSharePct');
    const dryHopShare = EXAMPLE_IPA.hops.map((_, i) => (i === 7 ? 10 : undefined));
    expectInputError(() => hopWeightsForIbuShares(EXAMPLE_IPA, PILOT_SYSTEM, 40, dryHopShare), 'hops.7.use');
  });
});
