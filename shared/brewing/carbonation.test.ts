import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  carbonationSetting,
  co2VolumesAtPressure,
  CO2_YIELD_G_PER_G,
  headPressureKpa,
  headPressurePsi,
  primingSugar,
  residualCo2Volumes,
} from './carbonation';
import { expectInputError } from './test-helpers';
import { cToF, fToC, gToOz, kpaToPsi, usGalToL } from '../quantities/convert';

describe('head pressure', () => {
  it('matches the brewing carbonation table (table values from memory, ±1 psi)', () => {
    // Carbonation table, from memory: 38 °F & 2.5 vol ≈ 11 psi; 40 °F & 2.5 vol ≈ 12 psi; 34 °F & 2.4 vol ≈ 8 psi.
    expect(Math.abs(headPressurePsi(38, 2.5) - 11)).toBeLessThan(1);
    expect(Math.abs(headPressurePsi(40, 2.5) - 12)).toBeLessThan(1);
    expect(Math.abs(headPressurePsi(34, 2.4) - 8)).toBeLessThan(1);
  });

  it("agrees within 10 % with Henry's law for CO2 (Sander's compilation: kH = 0.034 mol/(L·atm) at 298.15 K, d ln kH / d(1/T) = 2400 K)", () => {
    const tempC = 3;
    const volumes = 2.5;
    const kH = 0.034 * Math.exp(2400 * (1 / (tempC + 273.15) - 1 / 298.15));
    const absoluteAtm = volumes / (kH * 22.414);
    const henryPsiGauge = kpaToPsi((absoluteAtm - 1) * 101.325);
    expect(Math.abs(headPressurePsi(cToF(tempC), volumes) - henryPsiGauge) / henryPsiGauge).toBeLessThan(0.1);
  });

  it('inverts: pressure → volumes → pressure', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 2.0, max: 3.2, noNaN: true }),
        (tempC, volumes) => {
          expect(co2VolumesAtPressure(tempC, headPressureKpa(tempC, volumes))).toBeCloseTo(volumes, 8);
        },
      ),
    );
  });

  it('refuses a level the beer holds with no head pressure, and out-of-range input', () => {
    expectInputError(() => headPressurePsi(38, 1.0), 'volumes');
    expectInputError(() => headPressureKpa(60, 2.5), 'tempC');
    expectInputError(() => headPressureKpa(4, -1), 'volumes');
  });
});

describe('priming', () => {
  it('residual CO2 after fermentation (fit, from memory: 68 °F → ≈ 0.86 vol)', () => {
    expect(residualCo2Volumes(fToC(68))).toBeCloseTo(0.86, 2);
  });

  it('CO2 yields follow fermentation stoichiometry (glucose → 2 CO2: 88.02/180.16 g/g)', () => {
    expect(CO2_YIELD_G_PER_G.dextrose).toBeCloseTo(0.4886, 4);
    expect(CO2_YIELD_G_PER_G.sucrose).toBeCloseTo(0.5143, 4);
  });

  it('5 gal to 2.5 vol after 68 °F needs about 4–5 oz corn sugar (common practice, no source)', () => {
    const r = primingSugar(usGalToL(5), 2.5, fToC(68), 'dextroseMonohydrate');
    expect(gToOz(r.grams)).toBeGreaterThan(4);
    expect(gToOz(r.grams)).toBeLessThan(5);
    expect(primingSugar(usGalToL(5), 2.5, fToC(68), 'sucrose').grams).toBeLessThan(r.grams);
  });

  it('needs no sugar when the beer already holds the target', () => {
    const r = primingSugar(20, 1.2, 2, 'sucrose');
    expect(r.grams).toBe(0);
    expect(r.co2ToAddVolumes).toBeLessThan(0);
    expectInputError(() => primingSugar(0, 2.5, 20, 'sucrose'), 'beerVolumeL');
  });
});

describe('carbonation setting on a vessel', () => {
  it('gives the head pressure when the vessel is rated for it, and refuses above the rating', () => {
    const needed = headPressureKpa(2, 2.6);
    expect(carbonationSetting(2, 2.6, 200).pressureKpa).toBeCloseTo(needed, 10);
    expectInputError(() => carbonationSetting(2, 2.6, needed - 1), 'volumes');
    expectInputError(() => carbonationSetting(2, 2.6, 0), 'ratedKpa');
  });

  it('words the refusal in the units of the screen that asked', () => {
    // 4.5 volumes at 60 °F (15.6 °C) on a tank rated 30 psi: the testers' case. 30 psi = 206.8 kPa
    // (1 psi = 6.894757 kPa, NIST SP 811 appendix B); the pressure needed comes from the regression above.
    const tempC = (60 - 32) / 1.8;
    const rated = 30 * 6.894757;
    const needPsi = headPressurePsi(60, 4.5);
    expect(() => carbonationSetting(tempC, 4.5, rated, 'us')).toThrow(
      `4.5 volumes at 60 °F needs ${needPsi.toFixed(1)} psi, above this vessel's rated working pressure of 30.0 psi.`,
    );
    expect(() => carbonationSetting(tempC, 4.5, rated, 'us')).not.toThrow(/°C|kPa/);
    expect(() => carbonationSetting(tempC, 4.5, rated, 'metric')).toThrow(
      /^4\.5 volumes at 15\.6 °C needs \d+ kPa, above this vessel's rated working pressure of 207 kPa\./,
    );
  });
});
