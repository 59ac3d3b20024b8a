import { describe, expect, it } from 'vitest';
import { KEG_SIZES, lineVolumeL, packagingLoss, packagingTotals } from './packaging';
import { usGalToL } from '../quantities/convert';
import { expectInputError } from './test-helpers';

describe('packaging', () => {
  it('keg sizes are fractions of the 31-gal US beer barrel (27 CFR 25.11): 15.5, 7.75, 5.17 gal', () => {
    expect(KEG_SIZES.half_bbl).toBeCloseTo(usGalToL(15.5), 10);
    expect(KEG_SIZES.quarter_bbl).toBeCloseTo(usGalToL(7.75), 10);
    expect(KEG_SIZES.sixth_bbl).toBeCloseTo(usGalToL(5.1667), 3);
    expect(KEG_SIZES.keg_50l).toBe(50);
  });

  it('a 24 × 355 mL run holds 8.52 L (arithmetic)', () => {
    expect(lineVolumeL({ kind: 'can', sizeMl: 355, count: 24 })).toBeCloseTo(8.52, 10);
  });

  it('losses are knockout volume minus everything packaged', () => {
    const t = packagingTotals(
      [
        { kind: 'keg', size: 'half_bbl', count: 10 },
        { kind: 'keg', size: 'sixth_bbl', count: 6 },
        { kind: 'bottle', sizeMl: 500, count: 120 },
      ],
      1173,
    );
    const packaged = usGalToL(155) + usGalToL(31) + 60;
    expect(t.packagedL).toBeCloseTo(packaged, 6);
    expect(t.lossL).toBeCloseTo(1173 - packaged, 6);
    expect(t.lossFraction).toBeCloseTo((1173 - packaged) / 1173, 10);
  });

  it('refuses more in packages than was knocked out, and bad counts', () => {
    expectInputError(() => packagingTotals([{ kind: 'keg', size: 'keg_50l', count: 3 }], 100), 'lines');
    expectInputError(() => lineVolumeL({ kind: 'can', sizeMl: 355, count: 1.5 }), 'line.count');
  });
});

describe('packaging loss against the tank packaged from', () => {
  it('counts the loss against what went in and flags it above 10 % from a bright tank, 20 % from a fermenter (common practice, no source)', () => {
    // 1,000 L in, 950 L packaged: 50 L, 5 % (arithmetic)
    expect(packagingLoss(950, 1000, 'bright_tank')).toEqual({ lossL: 50, lossFraction: 0.05, implausible: false });
    expect(packagingLoss(480, 1000, 'bright_tank')).toMatchObject({
      lossL: 520,
      lossFraction: 0.52,
      implausible: true,
    });
    expect(packagingLoss(850, 1000, 'bright_tank').implausible).toBe(true);
    expect(packagingLoss(850, 1000, 'fermenter').implausible).toBe(false);
    expect(packagingLoss(1010, 1000, 'fermenter')).toMatchObject({ lossL: 0, lossFraction: 0 });
  });
});
