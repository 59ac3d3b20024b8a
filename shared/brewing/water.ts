/**
 * Brewing water: salt ion contributions, resulting profiles for mash and
 * sparge water, a non-negative least-squares salt solver, residual alkalinity
 * and the chloride-to-sulfate ratio. Concentrations are mg/L (ppm).
 */
import { MOLAR_MASS } from './atomic-weights';
import { BrewingInputError, requireFinite, requireNonNegative, requirePositive } from './errors';
import { nnls } from './nnls';
import type { IonKey, SaltAddition, SaltId, WaterProfile } from './types';

/** Ion keys in a fixed order (rows of the solver's matrix). */
export const ION_KEYS: readonly IonKey[] = [
  'calciumPpm',
  'magnesiumPpm',
  'sodiumPpm',
  'sulfatePpm',
  'chloridePpm',
  'bicarbonatePpm',
];

/** All-zero profile (distilled or reverse-osmosis water). */
export const DISTILLED_WATER: WaterProfile = Object.freeze({
  calciumPpm: 0,
  magnesiumPpm: 0,
  sodiumPpm: 0,
  sulfatePpm: 0,
  chloridePpm: 0,
  bicarbonatePpm: 0,
});

export interface SaltInfo {
  name: string;
  formula: string;
  /** g/mol, from IUPAC atomic weights. */
  molarMass: number;
  /** mg of each ion per g of salt (equivalently mg/L per g/L). */
  ionMgPerG: Partial<WaterProfile>;
}

const M = MOLAR_MASS;

function salt(name: string, formula: string, molarMass: number, ionMoles: Partial<Record<IonKey, number>>): SaltInfo {
  const ionMass: Record<IonKey, number> = {
    calciumPpm: M.calcium,
    magnesiumPpm: M.magnesium,
    sodiumPpm: M.sodium,
    sulfatePpm: M.sulfate,
    chloridePpm: M.chloride,
    bicarbonatePpm: M.bicarbonate,
  };
  const ionMgPerG: Partial<WaterProfile> = {};
  for (const [ion, moles] of Object.entries(ionMoles) as Array<[IonKey, number]>) {
    ionMgPerG[ion] = ((moles * ionMass[ion]) / molarMass) * 1000;
  }
  return { name, formula, molarMass, ionMgPerG };
}

/**
 * The salts, with ion yields from molar masses (stoichiometry × IUPAC atomic
 * weights). Chalk is counted as fully dissolved with CO2 (CaCO3 + CO2 + H2O →
 * Ca²⁺ + 2 HCO3⁻), so it adds two bicarbonates per formula unit; in plain
 * water it dissolves poorly, which the UI should say beside it.
 */
export const SALTS: Readonly<Record<SaltId, SaltInfo>> = {
  gypsum: salt('Gypsum', 'CaSO4·2H2O', M.calcium + M.sulfate + 2 * M.water, { calciumPpm: 1, sulfatePpm: 1 }),
  calciumChlorideDihydrate: salt(
    'Calcium chloride (dihydrate)',
    'CaCl2·2H2O',
    M.calcium + 2 * M.chloride + 2 * M.water,
    {
      calciumPpm: 1,
      chloridePpm: 2,
    },
  ),
  calciumChlorideAnhydrous: salt('Calcium chloride (anhydrous)', 'CaCl2', M.calcium + 2 * M.chloride, {
    calciumPpm: 1,
    chloridePpm: 2,
  }),
  epsomSalt: salt('Epsom salt', 'MgSO4·7H2O', M.magnesium + M.sulfate + 7 * M.water, {
    magnesiumPpm: 1,
    sulfatePpm: 1,
  }),
  tableSalt: salt('Table salt', 'NaCl', M.sodium + M.chloride, { sodiumPpm: 1, chloridePpm: 1 }),
  bakingSoda: salt('Baking soda', 'NaHCO3', M.sodium + M.bicarbonate, { sodiumPpm: 1, bicarbonatePpm: 1 }),
  chalk: salt('Chalk', 'CaCO3', M.calciumCarbonate, { calciumPpm: 1, bicarbonatePpm: 2 }),
};

/** Every salt id. */
export const SALT_IDS = Object.keys(SALTS) as SaltId[];

function requireProfile(profile: WaterProfile, field: string): void {
  for (const ion of ION_KEYS) requireNonNegative(profile[ion], `${field}.${ion}`, 'Ion concentration (mg/L)');
}

function requireSalt(id: SaltId, field: string): SaltInfo {
  const info = SALTS[id];
  if (!info) throw new BrewingInputError(field, `Unknown salt "${String(id)}".`);
  return info;
}

/** Ions (mg/L) that `grams` of a salt add to `volumeL` litres: grams/L × mg ion per g salt. */
export function ionContribution(saltId: SaltId, grams: number, volumeL: number, field = 'salt'): WaterProfile {
  const info = requireSalt(saltId, `${field}.salt`);
  requireNonNegative(grams, `${field}.grams`, 'Salt weight');
  requirePositive(volumeL, 'volumeL', 'Water volume');
  const out = { ...DISTILLED_WATER };
  for (const ion of ION_KEYS) out[ion] = ((info.ionMgPerG[ion] ?? 0) * grams) / volumeL;
  return out;
}

/**
 * Source water plus salt additions → resulting profile, mg/L. A zero volume
 * is accepted only with no salt in it (e.g. no sparge), and then is the source.
 */
export function waterAfterAdditions(
  source: WaterProfile,
  additions: readonly SaltAddition[],
  volumeL: number,
  field = 'salts',
): WaterProfile {
  requireProfile(source, 'source');
  requireNonNegative(volumeL, 'volumeL', 'Water volume');
  const out = { ...source };
  additions.forEach((addition, i) => {
    if (requireNonNegative(addition.grams, `${field}.${i}.grams`, 'Salt weight') === 0) return;
    if (volumeL === 0) throw new BrewingInputError(`${field}.${i}.grams`, 'Salt is added to a water volume of zero.');
    const delta = ionContribution(addition.salt, addition.grams, volumeL, `${field}.${i}`);
    for (const ion of ION_KEYS) out[ion] += delta[ion];
  });
  return out;
}

/** Profiles of treated mash water, sparge water, and the two mixed in proportion to their volumes. */
export function mashAndSpargeProfiles(
  source: WaterProfile,
  mashSalts: readonly SaltAddition[],
  mashVolumeL: number,
  spargeSalts: readonly SaltAddition[],
  spargeVolumeL: number,
): { mash: WaterProfile; sparge: WaterProfile; combined: WaterProfile } {
  requirePositive(mashVolumeL, 'mashVolumeL', 'Mash water volume');
  const mash = waterAfterAdditions(source, mashSalts, mashVolumeL, 'mashSalts');
  const sparge = waterAfterAdditions(source, spargeSalts, spargeVolumeL, 'spargeSalts');
  const total = mashVolumeL + spargeVolumeL;
  const combined = { ...DISTILLED_WATER };
  for (const ion of ION_KEYS) combined[ion] = (mash[ion] * mashVolumeL + sparge[ion] * spargeVolumeL) / total;
  return { mash, sparge, combined };
}

export interface SaltSolveInput {
  source: WaterProfile;
  target: WaterProfile;
  mashVolumeL: number;
  spargeVolumeL: number;
  allowedSalts: readonly SaltId[];
  /** Relative importance per ion in the fit (default 1). */
  ionWeights?: Partial<Record<IonKey, number>>;
}

export interface SaltSolution {
  /** Salt per litre of water (the same for mash and sparge), g/L. */
  gramsPerL: Partial<Record<SaltId, number>>;
  mashSalts: SaltAddition[];
  spargeSalts: SaltAddition[];
  /** Profile both waters reach. */
  achieved: WaterProfile;
  /** achieved − target, per ion, mg/L. */
  residualPpm: WaterProfile;
  /** Weighted ‖achieved − target‖₂, mg/L. */
  residualNorm: number;
  /** The same for adding nothing; residualNorm never exceeds it. */
  noAdditionResidualNorm: number;
}

/**
 * Inverse problem: the non-negative grams of each allowed salt that bring the
 * source water closest (weighted least squares, mg/L) to the target. Both mash
 * and sparge water are treated to the same profile, so the solve is per litre
 * (Lawson–Hanson NNLS) and grams follow from each volume.
 */
export function solveSaltAdditions(input: SaltSolveInput): SaltSolution {
  requireProfile(input.source, 'source');
  requireProfile(input.target, 'target');
  requirePositive(input.mashVolumeL, 'mashVolumeL', 'Mash water volume');
  requireNonNegative(input.spargeVolumeL, 'spargeVolumeL', 'Sparge water volume');
  const salts = [...new Set(input.allowedSalts)];
  salts.forEach((s, i) => requireSalt(s, `allowedSalts.${i}`));
  const weights = ION_KEYS.map((ion) => {
    const w = input.ionWeights?.[ion] ?? 1;
    return Math.sqrt(requireNonNegative(w, `ionWeights.${ion}`, 'Ion weight'));
  });
  const a = ION_KEYS.map((ion, i) => salts.map((s) => (SALTS[s].ionMgPerG[ion] ?? 0) * weights[i]!));
  const b = ION_KEYS.map((ion, i) => (input.target[ion] - input.source[ion]) * weights[i]!);
  const baseline = Math.sqrt(b.reduce((s, v) => s + v * v, 0));
  const solved = salts.length > 0 ? nnls(a, b) : { x: [], residualNorm: baseline };
  // NNLS is optimal over x ≥ 0, which includes x = 0; the guard only protects against round-off.
  const x = solved.residualNorm <= baseline ? solved.x.map((v) => Math.max(0, v)) : salts.map(() => 0);

  const gramsPerL: Partial<Record<SaltId, number>> = {};
  const achieved = { ...input.source };
  salts.forEach((s, j) => {
    gramsPerL[s] = x[j]!;
    for (const ion of ION_KEYS) achieved[ion] += (SALTS[s].ionMgPerG[ion] ?? 0) * x[j]!;
  });
  const residualPpm = { ...DISTILLED_WATER };
  let sq = 0;
  ION_KEYS.forEach((ion, i) => {
    residualPpm[ion] = achieved[ion] - input.target[ion];
    sq += (residualPpm[ion] * weights[i]!) ** 2;
  });
  const toAdditions = (volumeL: number): SaltAddition[] =>
    salts.filter((_, j) => x[j]! > 0).map((s) => ({ salt: s, grams: gramsPerL[s]! * volumeL }));
  return {
    gramsPerL,
    mashSalts: toAdditions(input.mashVolumeL),
    spargeSalts: toAdditions(input.spargeVolumeL),
    achieved,
    residualPpm,
    residualNorm: Math.sqrt(sq),
    noAdditionResidualNorm: baseline,
  };
}

/** Equivalent weights, g per equivalent: molar mass / charge. */
const EQ_WEIGHT = {
  calcium: MOLAR_MASS.calcium / 2,
  magnesium: MOLAR_MASS.magnesium / 2,
  bicarbonate: MOLAR_MASS.bicarbonate,
  calciumCarbonate: MOLAR_MASS.calciumCarbonate / 2,
};

/**
 * Residual alkalinity after Kolbach (1953): RA = alkalinity − (Ca/3.5 + Mg/7),
 * every term in mEq/L (Kolbach wrote it in °dH; the ratio is unit-free).
 * Alkalinity is taken as all bicarbonate (true below about pH 8.3). Also
 * given as ppm CaCO3 (mEq/L × 50.04), where the rule reads
 * RA = alk(as CaCO3) − (Ca/1.4 + Mg/1.7) with Ca and Mg in mg/L.
 */
export function residualAlkalinity(profile: WaterProfile): { mEqPerL: number; asCaCO3Ppm: number } {
  requireProfile(profile, 'profile');
  const alkalinity = profile.bicarbonatePpm / EQ_WEIGHT.bicarbonate;
  const hardnessEffect = profile.calciumPpm / EQ_WEIGHT.calcium / 3.5 + profile.magnesiumPpm / EQ_WEIGHT.magnesium / 7;
  const mEqPerL = alkalinity - hardnessEffect;
  return { mEqPerL, asCaCO3Ppm: mEqPerL * EQ_WEIGHT.calciumCarbonate };
}

/** Chloride-to-sulfate ratio by mass (mg/L ÷ mg/L); null when there is no sulfate to divide by. */
export function chlorideSulfateRatio(profile: WaterProfile): number | null {
  requireFinite(profile.chloridePpm, 'chloridePpm', 'Chloride');
  requireFinite(profile.sulfatePpm, 'sulfatePpm', 'Sulfate');
  return profile.sulfatePpm > 0 ? profile.chloridePpm / profile.sulfatePpm : null;
}
