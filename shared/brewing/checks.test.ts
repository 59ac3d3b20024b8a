import { describe, expect, it } from 'vitest';
import { ION_CEILINGS_PPM, targetWarnings, waterDoseWarnings } from './checks';
import { DISTILLED_WATER, waterAfterAdditions } from './water';

const targets = { og: 1.058, fg: 1.016, ibu: 24, srm: 9 };

describe('target warnings (tolerances: common practice, no source)', () => {
  it('says nothing within 2 points, 10 % IBU and 2 SRM', () => {
    expect(targetWarnings({ og: 1.0595, fg: 1.0145, ibu: 26.3, srm: 10.9 }, targets)).toEqual([]);
  });
  it('names each figure that is off and which way', () => {
    const w = targetWarnings({ og: 1.0615, fg: 1.013, ibu: 18, srm: 12 }, targets);
    expect(w.map((x) => x.field)).toEqual(['targets.og', 'targets.fg', 'targets.ibu', 'targets.srm']);
    expect(w[0]!.message).toBe('OG 1.062 is 4 points above the target 1.058.');
    expect(w[2]!.message).toBe('IBU 18 is below the target 24.');
  });
  it('uses at least 2 IBU of slack for low-bitterness targets', () => {
    expect(targetWarnings({ og: 1.058, fg: 1.016, ibu: 11.9, srm: 9 }, { ...targets, ibu: 10 })).toEqual([]);
  });
});

describe('salt dose warnings (ion ceilings: common practice, no source)', () => {
  it('flags calcium and sulfate when 10 g of gypsum goes into 10 L of distilled water', () => {
    // Gypsum adds 232.8 mg/L Ca and 557.9 mg/L SO4 per g/L (IUPAC atomic weights), so 1 g/L is over both ceilings.
    const heavy = waterAfterAdditions(DISTILLED_WATER, [{ salt: 'gypsum', grams: 10 }], 10);
    const w = waterDoseWarnings({ mash: heavy, sparge: DISTILLED_WATER });
    expect(w.map((x) => x.message)).toEqual([
      'Calcium in the mash water is 233 ppm, above about 200 ppm: check the salt amounts.',
      'Sulfate in the mash water is 558 ppm, above about 500 ppm: check the salt amounts.',
    ]);
  });
  it('is quiet for a moderate dose', () => {
    const light = waterAfterAdditions(DISTILLED_WATER, [{ salt: 'gypsum', grams: 2 }], 10);
    expect(light.calciumPpm).toBeLessThan(ION_CEILINGS_PPM.calciumPpm!);
    expect(waterDoseWarnings({ mash: light, sparge: light })).toEqual([]);
  });
});
