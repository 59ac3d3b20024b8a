import { describe, expect, it } from 'vitest';
import { PILOT_SYSTEM } from './example-recipes';
import {
  GRAIN_DISPLACEMENT_L_PER_KG,
  hltTemperatureForRecirculationC,
  infusionVolumeL,
  infusionVolumeQt,
  planVolumes,
  postBoilVolumeL,
  preBoilVolumeL,
  strikeTemperatureC,
  strikeTemperatureF,
  strikeVolumeL,
} from './mash-water';
import { expectInputError } from './test-helpers';

describe('strike water', () => {
  it("Palmer's worked example (How to Brew): 1.5 qt/lb, grain 70 °F, target 150 °F → ≈ 160.7 °F", () => {
    expect(strikeTemperatureF(70, 150, 1.5)).toBeCloseTo(160.7, 1);
  });

  it("Palmer's metric form (How to Brew): Tw = (0.41/r)(T2 − T1) + T2 (hand-worked: 3 L/kg, 20 → 67 °C = 73.4 °C)", () => {
    expect(strikeTemperatureC(20, 67, 3)).toBeCloseTo(73.42, 2);
  });

  it('volume = grain × thickness', () => {
    expect(strikeVolumeL(10, 2.8)).toBeCloseTo(28, 12);
    expectInputError(() => strikeVolumeL(-1, 3), 'grainKg');
    expectInputError(() => strikeTemperatureC(20, 67, 0), 'thickness');
  });
});

describe('infusions and recirculation', () => {
  it("Palmer's infusion equation, hand-worked: 8 lb, 8 qt, 104 → 140 °F with 210 °F water → 4.94 qt", () => {
    // Wa = (140 − 104)(0.2·8 + 8)/(210 − 140) = 36 × 9.6 / 70.
    expect(infusionVolumeQt(8, 8, 104, 140, 210)).toBeCloseTo(4.937, 3);
  });

  it('metric infusion to mash out (hand-worked: 5 kg, 15 L, 66 → 76 °C with 95 °C water = 8.97 L)', () => {
    // Wa = (76 − 66)(0.41·5 + 15)/(95 − 76) = 10 × 17.05 / 19.
    expect(infusionVolumeL({ grainKg: 5, mashWaterL: 15, currentC: 66, targetC: 76, infusionWaterC: 95 })).toBeCloseTo(
      8.974,
      3,
    );
    expectInputError(
      () => infusionVolumeL({ grainKg: 5, mashWaterL: 15, currentC: 66, targetC: 76, infusionWaterC: 70 }),
      'infusionWaterC',
    );
  });

  it('HLT setpoint from coil effectiveness (hand-worked: 64 → 68 °C at ε 0.8 → 69 °C)', () => {
    expect(hltTemperatureForRecirculationC(64, 68, 0.8)).toBeCloseTo(69, 12);
    expect(hltTemperatureForRecirculationC(64, 68, 1)).toBeCloseTo(68, 12);
    expectInputError(() => hltTemperatureForRecirculationC(64, 68, 0), 'hltCoilEffectiveness');
  });
});

describe('volume chain', () => {
  it('pre-boil = post-boil + boil-off (hand-worked: 25 L + 4 L/h × 1 h = 29 L)', () => {
    expect(preBoilVolumeL(25, 4, 60)).toBeCloseTo(29, 12);
  });

  it('post-boil allows 4 % cooling shrinkage (common practice) and kettle losses', () => {
    expect(postBoilVolumeL(20, 1, 1)).toBeCloseTo(21 / 0.96 + 1, 12);
    expectInputError(() => postBoilVolumeL(0, 1, 1), 'batchVolumeL');
  });

  it('balances water in and wort out', () => {
    const { volumes, warnings } = planVolumes(PILOT_SYSTEM, 9, 3, 5);
    expect(warnings).toEqual([]);
    expect(volumes.strikeL + volumes.infusionL + volumes.spargeL).toBeCloseTo(volumes.totalWaterL, 10);
    expect(volumes.totalWaterL).toBeCloseTo(
      volumes.preBoilL + 9 * PILOT_SYSTEM.grainAbsorptionLPerKg + PILOT_SYSTEM.mashTunDeadSpaceL,
      10,
    );
    expect(volumes.mashVolumeL).toBeCloseTo(32 + 9 * GRAIN_DISPLACEMENT_L_PER_KG, 10);
    expect(volumes.packagedL).toBeCloseTo(PILOT_SYSTEM.batchVolumeL - PILOT_SYSTEM.fermenterLossL, 10);
  });

  it('warns when the mash tun or kettle would overfill, and when strike water exceeds the total', () => {
    const small = { ...PILOT_SYSTEM, maxMashTunVolumeL: 20, maxKettleVolumeL: 30 };
    const codes = planVolumes(small, 9, 3).warnings.map((w) => w.code);
    expect(codes).toContain('mashTunOverfilled');
    expect(codes).toContain('kettleOverfilled');
    const soupy = planVolumes(PILOT_SYSTEM, 20, 5);
    expect(soupy.warnings.map((w) => w.code)).toContain('strikeExceedsTotalWater');
    expect(soupy.volumes.spargeL).toBe(0);
  });

  it('rejects impossible equipment', () => {
    expectInputError(() => planVolumes({ ...PILOT_SYSTEM, batchVolumeL: 0 }, 9, 3), 'equipment.batchVolumeL');
    expectInputError(
      () => planVolumes({ ...PILOT_SYSTEM, brewhouseEfficiency: 1.2 }, 9, 3),
      'equipment.brewhouseEfficiency',
    );
  });
});
