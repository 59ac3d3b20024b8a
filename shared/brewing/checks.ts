/**
 * Checks that turn computed numbers into warnings for the editor: figures away from the
 * recipe's own targets, and salt additions that push an ion past a sensible ceiling.
 */
import { gravityPoints } from './gravity';
import type { BrewingWarning, ComputedRecipe, ComputedWater, IonKey } from './types';

export interface RecipeTargets {
  og: number;
  fg: number;
  ibu: number;
  srm: number;
}

/**
 * How far a computed figure may sit from its target before we warn (common practice, no source):
 * 2 gravity points on OG and FG, 10 % of the IBU (at least 2 IBU), 2 SRM.
 */
export const TARGET_TOLERANCE = { gravityPoints: 2, ibuShare: 0.1, ibuMin: 2, srm: 2 } as const;

/** Warnings for OG, FG, IBU and SRM further from the targets than {@link TARGET_TOLERANCE}. */
export function targetWarnings(
  computed: Pick<ComputedRecipe, 'og' | 'fg' | 'ibu' | 'srm'>,
  targets: RecipeTargets,
): BrewingWarning[] {
  const out: BrewingWarning[] = [];
  const gravity = (label: 'OG' | 'FG', value: number, target: number, field: string) => {
    const off = gravityPoints(value) - gravityPoints(target);
    if (Math.abs(off) > TARGET_TOLERANCE.gravityPoints) {
      out.push({
        code: 'offTarget',
        field,
        message: `${label} ${value.toFixed(3)} is ${Math.abs(off).toFixed(0)} points ${off > 0 ? 'above' : 'below'} the target ${target.toFixed(3)}.`,
      });
    }
  };
  gravity('OG', computed.og, targets.og, 'targets.og');
  gravity('FG', computed.fg, targets.fg, 'targets.fg');
  const ibuOff = computed.ibu - targets.ibu;
  if (Math.abs(ibuOff) > Math.max(TARGET_TOLERANCE.ibuMin, TARGET_TOLERANCE.ibuShare * targets.ibu)) {
    out.push({
      code: 'offTarget',
      field: 'targets.ibu',
      message: `IBU ${computed.ibu.toFixed(0)} is ${ibuOff > 0 ? 'above' : 'below'} the target ${targets.ibu.toFixed(0)}.`,
    });
  }
  if (Math.abs(computed.srm - targets.srm) > TARGET_TOLERANCE.srm) {
    out.push({
      code: 'offTarget',
      field: 'targets.srm',
      message: `SRM ${computed.srm.toFixed(1)} is away from the target ${targets.srm.toFixed(1)}.`,
    });
  }
  return out;
}

/**
 * Ion levels above which brewing water is usually considered over-salted, mg/L
 * (common practice, no source). Bicarbonate is left to residual alkalinity.
 */
export const ION_CEILINGS_PPM: Readonly<Partial<Record<IonKey, number>>> = {
  calciumPpm: 200,
  magnesiumPpm: 40,
  sodiumPpm: 150,
  sulfatePpm: 500,
  chloridePpm: 250,
};

const ION_NAMES: Record<IonKey, string> = {
  calciumPpm: 'Calcium',
  magnesiumPpm: 'Magnesium',
  sodiumPpm: 'Sodium',
  sulfatePpm: 'Sulfate',
  chloridePpm: 'Chloride',
  bicarbonatePpm: 'Bicarbonate',
};

/** Warnings for each ion in the mash or sparge water above {@link ION_CEILINGS_PPM}. */
export function waterDoseWarnings(water: Pick<ComputedWater, 'mash' | 'sparge'>): BrewingWarning[] {
  const out: BrewingWarning[] = [];
  for (const vessel of ['mash', 'sparge'] as const) {
    for (const [ion, ceiling] of Object.entries(ION_CEILINGS_PPM) as [IonKey, number][]) {
      const ppm = water[vessel][ion];
      if (ppm > ceiling) {
        out.push({
          code: 'ionAboveCeiling',
          field: `water.${vessel}Salts`,
          message: `${ION_NAMES[ion]} in the ${vessel} water is ${ppm.toFixed(0)} ppm, above about ${ceiling} ppm: check the salt amounts.`,
        });
      }
    }
  }
  return out;
}
