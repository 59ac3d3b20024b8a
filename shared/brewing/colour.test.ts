import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ebcToSrm, maltColourUnits, moreySrm, srmFromFermentables, srmToEbc, srmToHex, srmToRgb } from './colour';
import { expectInputError } from './test-helpers';
import { lbToKg, usGalToL } from '../quantities/convert';

describe('colour', () => {
  it('MCU = Σ(lb × °L)/gal (hand-worked: 10 lb at 2 °L + 1 lb at 60 °L in 5 gal = 16)', () => {
    const items = [
      { weightKg: lbToKg(10), colourLovibond: 2 },
      { weightKg: lbToKg(1), colourLovibond: 60 },
    ];
    expect(maltColourUnits(items, usGalToL(5))).toBeCloseTo(16, 10);
    // Morey's equation SRM = 1.4922·MCU^0.6859, hand-worked: MCU 16 → 9.99.
    expect(srmFromFermentables(items, usGalToL(5))).toBeCloseTo(9.99, 2);
  });

  it("Morey's equation (hand-worked: MCU 10 → 7.24, MCU 1 → 1.4922)", () => {
    expect(moreySrm(10)).toBeCloseTo(7.24, 2);
    expect(moreySrm(1)).toBeCloseTo(1.4922, 10);
    expect(moreySrm(0)).toBe(0);
  });

  it('EBC = SRM × 1.97', () => {
    expect(srmToEbc(10)).toBeCloseTo(19.7, 10);
    expect(ebcToSrm(srmToEbc(7.3))).toBeCloseTo(7.3, 12);
  });

  it('swatch colours are #rrggbb and darken as SRM rises', () => {
    expect(srmToHex(5)).toMatch(/^#[0-9a-f]{6}$/);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 60, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true }), (a, b) => {
        const [lo, hi] = a < b ? [a, b] : [b, a];
        const light = (s: number) => {
          const { r, g, b: blue } = srmToRgb(s);
          return r + g + blue;
        };
        expect(light(hi)).toBeLessThanOrEqual(light(lo));
      }),
    );
  });

  it('rejects negative input', () => {
    expectInputError(() => srmToRgb(-1), 'srm');
    expectInputError(() => maltColourUnits([{ weightKg: -1, colourLovibond: 2 }], 10), 'fermentables.0.weightKg');
    expectInputError(() => maltColourUnits([{ weightKg: 1, colourLovibond: 2 }], 0), 'volumeL');
  });
});
