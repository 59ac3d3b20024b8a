/**
 * Molar masses from atomic weights, so that salt and sugar factors follow
 * from chemistry instead of being copied as bare numbers.
 */

/**
 * IUPAC standard atomic weights (CIAAW, Standard Atomic Weights 2021); for
 * elements published as intervals (H, C, O, Mg, S, Cl) the IUPAC conventional
 * values are used. g/mol.
 */
export const ATOMIC_WEIGHTS = {
  H: 1.008,
  C: 12.011,
  O: 15.999,
  Na: 22.98976928,
  Mg: 24.305,
  S: 32.06,
  Cl: 35.45,
  Ca: 40.078,
} as const;

export type Element = keyof typeof ATOMIC_WEIGHTS;

/** Molar mass of a formula given as element counts, g/mol. */
export function molarMass(formula: Partial<Record<Element, number>>): number {
  let sum = 0;
  for (const [element, count] of Object.entries(formula) as Array<[Element, number]>) {
    sum += ATOMIC_WEIGHTS[element] * count;
  }
  return sum;
}

/** Molar masses used across the module, g/mol. */
export const MOLAR_MASS = {
  water: molarMass({ H: 2, O: 1 }),
  carbonDioxide: molarMass({ C: 1, O: 2 }),
  calcium: ATOMIC_WEIGHTS.Ca,
  magnesium: ATOMIC_WEIGHTS.Mg,
  sodium: ATOMIC_WEIGHTS.Na,
  chloride: ATOMIC_WEIGHTS.Cl,
  sulfate: molarMass({ S: 1, O: 4 }),
  bicarbonate: molarMass({ H: 1, C: 1, O: 3 }),
  calciumCarbonate: molarMass({ Ca: 1, C: 1, O: 3 }),
  glucose: molarMass({ C: 6, H: 12, O: 6 }),
  sucrose: molarMass({ C: 12, H: 22, O: 11 }),
} as const;
