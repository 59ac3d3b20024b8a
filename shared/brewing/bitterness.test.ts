import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  buGu,
  hopWeightForIbu,
  ibuForAddition,
  tinsethBignessFactor,
  tinsethBoilTimeFactor,
  tinsethUtilisation,
  totalIbu,
  whirlpoolTemperatureFactor,
} from './bitterness';
import { expectInputError } from './test-helpers';
import { ozToG, usGalToL } from '../quantities/convert';

describe('Tinseth utilisation', () => {
  it("matches Tinseth's published utilisation table (table values from memory; formula is his)", () => {
    expect(tinsethUtilisation(1.05, 60)).toBeCloseTo(0.231, 3);
    expect(tinsethUtilisation(1.05, 30)).toBeCloseTo(0.177, 3);
    expect(tinsethUtilisation(1.03, 60)).toBeCloseTo(0.276, 3);
    expect(tinsethUtilisation(1.07, 60)).toBeCloseTo(0.193, 3);
    expect(tinsethUtilisation(1.05, 0)).toBe(0);
  });

  it('is built from the bigness and boil-time factors (Tinseth: 1.65·0.000125^(G−1) and (1 − e^(−0.04t))/4.15)', () => {
    expect(tinsethBignessFactor(1)).toBeCloseTo(1.65, 12);
    expect(tinsethBoilTimeFactor(1e6)).toBeCloseTo(1 / 4.15, 12);
  });
});

describe('IBU', () => {
  const hop = { name: 'Test', alphaAcidPct: 10, use: 'boil' as const, minutes: 60, weightG: ozToG(1) };

  it('per addition: utilisation × mg/L alpha acids (hand-worked: 1 oz 10 % AA, 60 min, 5 gal, 1.050 → 34.5 IBU)', () => {
    // mg/L = 0.10 × 28.35 g × 1000 / 18.93 L = 149.8; × 0.2307 = 34.5.
    expect(ibuForAddition(hop, 1.05, usGalToL(5))).toBeCloseTo(34.55, 1);
  });

  it('dry hops add 0 IBU', () => {
    expect(ibuForAddition({ ...hop, use: 'dryHop', minutes: 0 }, 1.05, 20)).toBe(0);
  });

  it('whirlpool: equals a boil addition at 100 °C and falls with temperature (labelled approximation)', () => {
    const whirlpool = { ...hop, use: 'whirlpool' as const, minutes: 20 };
    expect(ibuForAddition({ ...whirlpool, whirlpoolTempC: 100 }, 1.05, 20)).toBeCloseTo(
      ibuForAddition({ ...hop, minutes: 20 }, 1.05, 20),
      10,
    );
    // Arrhenius with Ea/R = 11858 K (Malowicki & Shellhammer 2005, from memory): 80 °C → ≈ 0.165 of the boiling rate.
    expect(whirlpoolTemperatureFactor(80)).toBeCloseTo(0.165, 3);
    expect(whirlpoolTemperatureFactor(70)).toBeLessThan(whirlpoolTemperatureFactor(80));
    expectInputError(() => ibuForAddition(whirlpool, 1.05, 20), 'hop.whirlpoolTempC');
  });

  it('sums additions', () => {
    const { perAddition, total } = totalIbu([hop, { ...hop, minutes: 15 }], 1.05, 20);
    expect(total).toBeCloseTo(perAddition[0]! + perAddition[1]!, 12);
  });

  it('inverse: hop weight for a target IBU round-trips', () => {
    const weight = hopWeightForIbu(40, hop, 1.055, 25);
    expect(ibuForAddition({ ...hop, weightG: weight }, 1.055, 25)).toBeCloseTo(40, 10);
    expect(hopWeightForIbu(0, hop, 1.055, 25)).toBe(0);
    expectInputError(() => hopWeightForIbu(10, { ...hop, use: 'dryHop' }, 1.05, 20), 'hop.use');
  });

  it('grows with hop weight', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5000, noNaN: true }),
        fc.double({ min: 1.001, max: 10, noNaN: true }),
        fc.double({ min: 1, max: 120, noNaN: true }),
        fc.double({ min: 1.0, max: 1.12, noNaN: true }),
        (lo, factor, minutes, gravity) => {
          const hi = lo * factor;
          const at = (weightG: number) => ibuForAddition({ ...hop, minutes, weightG }, gravity, 100);
          expect(at(hi)).toBeGreaterThan(at(lo));
        },
      ),
    );
  });

  it('BU:GU = IBU / gravity points (hand-worked: 40 IBU at 1.050 → 0.8)', () => {
    expect(buGu(40, 1.05)).toBeCloseTo(0.8, 12);
    expectInputError(() => buGu(40, 1.0), 'og');
  });

  it('rejects alpha acid outside (0, 30] % and negative weights', () => {
    expectInputError(() => ibuForAddition({ ...hop, alphaAcidPct: 0 }, 1.05, 20), 'hop.alphaAcidPct');
    expectInputError(() => ibuForAddition({ ...hop, alphaAcidPct: 31 }, 1.05, 20), 'hop.alphaAcidPct');
    expectInputError(() => ibuForAddition({ ...hop, weightG: -1 }, 1.05, 20), 'hop.weightG');
    expectInputError(() => ibuForAddition(hop, 1.05, 0), 'volumeL');
  });
});
