import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { nnls } from './nnls';
import { expectInputError } from './test-helpers';
import type { SaltId, WaterProfile } from './types';
import {
  chlorideSulfateRatio,
  DISTILLED_WATER,
  ION_KEYS,
  ionContribution,
  mashAndSpargeProfiles,
  residualAlkalinity,
  SALT_IDS,
  solveSaltAdditions,
  waterAfterAdditions,
} from './water';

describe('salt ion contributions (molar masses from IUPAC standard atomic weights)', () => {
  // Each expected value is ion molar mass × moles / salt molar mass × 1000, using the
  // IUPAC conventional atomic weights H 1.008, C 12.011, O 15.999, Na 22.990, Mg 24.305, S 32.06, Cl 35.45, Ca 40.078.
  const cases: Array<[SaltId, Partial<WaterProfile>]> = [
    ['gypsum', { calciumPpm: 232.8, sulfatePpm: 557.9 }],
    ['calciumChlorideDihydrate', { calciumPpm: 272.6, chloridePpm: 482.3 }],
    ['calciumChlorideAnhydrous', { calciumPpm: 361.1, chloridePpm: 638.9 }],
    ['epsomSalt', { magnesiumPpm: 98.6, sulfatePpm: 389.7 }],
    ['tableSalt', { sodiumPpm: 393.4, chloridePpm: 606.6 }],
    ['bakingSoda', { sodiumPpm: 273.7, bicarbonatePpm: 726.3 }],
    // Chalk dissolved with CO2: Ca²⁺ + 2 HCO3⁻ per CaCO3.
    ['chalk', { calciumPpm: 400.4, bicarbonatePpm: 1219.3 }],
  ];
  it.each(cases)('1 g of %s in 1 L', (salt, expected) => {
    const got = ionContribution(salt, 1, 1);
    for (const ion of ION_KEYS) expect(got[ion]).toBeCloseTo(expected[ion] ?? 0, 1);
  });

  it('scales with grams and volume', () => {
    expect(ionContribution('gypsum', 5, 20).calciumPpm).toBeCloseTo((232.79 * 5) / 20, 1);
    expectInputError(() => ionContribution('gypsum', 1, 0), 'volumeL');
    expectInputError(() => ionContribution('gypsum', -1, 10), 'salt.grams');
  });
});

const source: WaterProfile = {
  calciumPpm: 20,
  magnesiumPpm: 5,
  sodiumPpm: 10,
  sulfatePpm: 15,
  chloridePpm: 20,
  bicarbonatePpm: 60,
};

describe('profiles', () => {
  it('adds salts to source water separately for mash and sparge', () => {
    const { mash, sparge, combined } = mashAndSpargeProfiles(
      source,
      [{ salt: 'gypsum', grams: 4 }],
      20,
      [{ salt: 'gypsum', grams: 1 }],
      10,
    );
    expect(mash.calciumPpm).toBeCloseTo(20 + (232.79 * 4) / 20, 1);
    expect(sparge.calciumPpm).toBeCloseTo(20 + (232.79 * 1) / 10, 1);
    expect(combined.calciumPpm).toBeCloseTo((mash.calciumPpm * 20 + sparge.calciumPpm * 10) / 30, 10);
  });

  it('accepts a zero sparge volume only without salt in it', () => {
    expect(waterAfterAdditions(source, [], 0)).toEqual(source);
    expectInputError(() => waterAfterAdditions(source, [{ salt: 'gypsum', grams: 1 }], 0), 'salts.0.grams');
  });

  it('Cl:SO4 ratio, null without sulfate', () => {
    expect(chlorideSulfateRatio({ ...source, chloridePpm: 100, sulfatePpm: 50 })).toBe(2);
    expect(chlorideSulfateRatio({ ...source, sulfatePpm: 0 })).toBeNull();
  });
});

describe('residual alkalinity (Kolbach)', () => {
  it('is zero when alkalinity equals Ca/3.5 + Mg/7 in mEq/L', () => {
    // 1 mEq/L alkalinity as HCO3 (61.02 mg/L) balanced by 3.5 mEq/L Ca (70.14 mg/L).
    const ra = residualAlkalinity({ ...DISTILLED_WATER, bicarbonatePpm: 61.017, calciumPpm: 3.5 * 20.039 });
    expect(ra.mEqPerL).toBeCloseTo(0, 4);
  });

  it('agrees with the ppm-as-CaCO3 form RA = alk − (Ca/1.4 + Mg/1.7) (Kolbach restated; common practice)', () => {
    const w = { ...DISTILLED_WATER, bicarbonatePpm: 180, calciumPpm: 50, magnesiumPpm: 10 };
    const alkAsCaCO3 = (180 * 50.04) / 61.017;
    expect(residualAlkalinity(w).asCaCO3Ppm).toBeCloseTo(alkAsCaCO3 - (50 / 1.4 + 10 / 1.7), 0);
  });
});

describe('Lawson–Hanson NNLS', () => {
  it('solves a small case with an active bound (hand-worked: x = [0.5, 0])', () => {
    const r = nnls(
      [
        [1, 0],
        [0, 1],
        [1, 1],
      ],
      [1, -1, 0],
    );
    expect(r.x[0]).toBeCloseTo(0.5, 10);
    expect(r.x[1]).toBe(0);
    expect(r.residualNorm).toBeCloseTo(Math.sqrt(1.5), 10);
  });

  it('recovers an exact non-negative combination', () => {
    const a = [
      [2, 0, 1],
      [0, 1, 1],
      [1, 1, 0],
      [3, 0, 0],
    ];
    const x = [0.5, 2, 1];
    const b = a.map((row) => row.reduce((s, v, j) => s + v * x[j]!, 0));
    nnls(a, b).x.forEach((v, j) => expect(v).toBeCloseTo(x[j]!, 8));
  });
});

describe('salt solver', () => {
  it('reaches a profile built from allowed salts, with zero residual', () => {
    const target = waterAfterAdditions(
      source,
      [
        { salt: 'gypsum', grams: 0.2 },
        { salt: 'calciumChlorideDihydrate', grams: 0.1 },
        { salt: 'epsomSalt', grams: 0.05 },
      ],
      1,
    );
    const s = solveSaltAdditions({
      source,
      target,
      mashVolumeL: 30,
      spargeVolumeL: 15,
      allowedSalts: ['gypsum', 'calciumChlorideDihydrate', 'epsomSalt', 'tableSalt'],
    });
    expect(s.gramsPerL.gypsum).toBeCloseTo(0.2, 6);
    expect(s.gramsPerL.calciumChlorideDihydrate).toBeCloseTo(0.1, 6);
    expect(s.mashSalts.find((x) => x.salt === 'gypsum')!.grams).toBeCloseTo(6, 4);
    expect(s.spargeSalts.find((x) => x.salt === 'gypsum')!.grams).toBeCloseTo(3, 4);
    expect(s.residualNorm).toBeLessThan(1e-6);
  });

  it('adds nothing when the target is below the source (salts only add ions)', () => {
    const target = { ...source, calciumPpm: 5, sulfatePpm: 5 };
    const s = solveSaltAdditions({ source, target, mashVolumeL: 10, spargeVolumeL: 5, allowedSalts: ['gypsum'] });
    expect(s.mashSalts).toEqual([]);
    expect(s.residualNorm).toBeCloseTo(s.noAdditionResidualNorm, 10);
  });

  it('copes with collinear salts (both calcium chloride forms allowed)', () => {
    const target = { ...source, calciumPpm: 80, chloridePpm: 120 };
    const s = solveSaltAdditions({
      source,
      target,
      mashVolumeL: 10,
      spargeVolumeL: 5,
      allowedSalts: ['calciumChlorideDihydrate', 'calciumChlorideAnhydrous'],
    });
    expect(s.residualNorm).toBeLessThan(s.noAdditionResidualNorm);
    for (const v of Object.values(s.gramsPerL)) expect(v).toBeGreaterThanOrEqual(0);
  });

  const ppm = fc.double({ min: 0, max: 400, noNaN: true });
  const profile = fc.record({
    calciumPpm: ppm,
    magnesiumPpm: ppm,
    sodiumPpm: ppm,
    sulfatePpm: ppm,
    chloridePpm: ppm,
    bicarbonatePpm: ppm,
  });

  it('never returns a negative amount and never does worse than adding nothing', () => {
    fc.assert(
      fc.property(
        profile,
        profile,
        fc.subarray(SALT_IDS, { minLength: 0 }),
        fc.double({ min: 1, max: 2000, noNaN: true }),
        (src, target, salts, volume) => {
          const s = solveSaltAdditions({
            source: src,
            target,
            mashVolumeL: volume,
            spargeVolumeL: volume / 2,
            allowedSalts: salts,
          });
          for (const v of Object.values(s.gramsPerL)) expect(v).toBeGreaterThanOrEqual(0);
          for (const a of [...s.mashSalts, ...s.spargeSalts]) expect(a.grams).toBeGreaterThanOrEqual(0);
          expect(s.residualNorm).toBeLessThanOrEqual(s.noAdditionResidualNorm + 1e-9);
          expect(Number.isFinite(s.residualNorm)).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('is at least as good as any single allowed salt alone (a cheap optimality check)', () => {
    fc.assert(
      fc.property(profile, profile, (src, target) => {
        const s = solveSaltAdditions({
          source: src,
          target,
          mashVolumeL: 10,
          spargeVolumeL: 0,
          allowedSalts: SALT_IDS,
        });
        for (const salt of SALT_IDS) {
          const single = solveSaltAdditions({
            source: src,
            target,
            mashVolumeL: 10,
            spargeVolumeL: 0,
            allowedSalts: [salt],
          });
          expect(s.residualNorm).toBeLessThanOrEqual(single.residualNorm + 1e-6);
        }
      }),
      { numRuns: 100 },
    );
  });

  it('rejects negative target ions', () => {
    expectInputError(
      () =>
        solveSaltAdditions({
          source,
          target: { ...source, sodiumPpm: -1 },
          mashVolumeL: 1,
          spargeVolumeL: 1,
          allowedSalts: ['gypsum'],
        }),
      'target.sodiumPpm',
    );
  });
});
