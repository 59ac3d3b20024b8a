/**
 * Gravity, extract and alcohol. Specific gravity is 20 °C/20 °C as the ASBC
 * tables use; °Plato is g extract per 100 g wort.
 */
import {
  BrewingInputError,
  MAX_SG,
  MIN_SG,
  requireEfficiency,
  requireFinite,
  requireGravity,
  requireInRange,
  requireNonNegative,
  requirePositive,
} from './errors';
import type { FermentablePotential, FermentableStage } from './types';
import { KG_PER_LB, L_PER_US_GAL, platoFromSg, platoSlope, sgFromPlato } from '../quantities/convert';

/** °Plato at the ends of the accepted gravity range. */
export const MIN_PLATO = platoFromSg(MIN_SG);
export const MAX_PLATO = platoFromSg(MAX_SG);

/** Specific gravity → °Plato by the ASBC polynomial. */
export function sgToPlato(sg: number, field = 'sg'): number {
  requireGravity(sg, field);
  return platoFromSg(sg);
}

/** °Plato → specific gravity (the exact inverse of {@link sgToPlato}). */
export function platoToSg(plato: number, field = 'plato'): number {
  requireInRange(plato, field, MIN_PLATO, MAX_PLATO, '°Plato');
  return sgFromPlato(plato);
}

/** Gravity points: (SG − 1) × 1000, e.g. 1.052 → 52. */
export function gravityPoints(sg: number, field = 'sg'): number {
  requireGravity(sg, field);
  return (sg - 1) * 1000;
}

/** Gravity points → specific gravity. */
export function sgFromPoints(points: number, field = 'points'): number {
  requireFinite(points, field, 'Gravity points');
  return requireGravity(1 + points / 1000, field);
}

/** Density of water at 20 °C, g/L (CRC Handbook of Chemistry and Physics, 0.998 21 g/mL; from memory). */
const WATER_G_PER_L_20C = 998.21;

/**
 * Gravity points of 1 lb sucrose made up to 1 US gal: the 100 % reference for
 * extract %. Derived from the definition of °Plato (g sucrose per 100 g
 * solution, so g/L = °P/100 × SG × ρwater) and the ASBC polynomial: ≈ 46.2.
 */
export const SUCROSE_PPG: number = (() => {
  const gramsPerL = (KG_PER_LB * 1000) / L_PER_US_GAL;
  let sg = 1.046;
  for (let i = 0; i < 50; i++) {
    const gap = (platoFromSg(sg) / 100) * sg * WATER_G_PER_L_20C - gramsPerL;
    const slope = ((platoSlope(sg) * sg + platoFromSg(sg)) / 100) * WATER_G_PER_L_20C;
    sg -= gap / slope;
  }
  return (sg - 1) * 1000;
})();

/** Extract % (of sucrose) → PPG. */
export function extractPctToPpg(extractPct: number, field = 'extractPct'): number {
  return (requireInRange(extractPct, field, 0, 100, 'Extract %') / 100) * SUCROSE_PPG;
}

/** PPG → extract % (of sucrose). */
export function ppgToExtractPct(ppg: number, field = 'ppg'): number {
  return (requireInRange(ppg, field, 0, SUCROSE_PPG, 'PPG') / SUCROSE_PPG) * 100;
}

/** 1 PPG expressed in gravity points · L / kg (≈ 8.345). */
const POINT_L_PER_KG_PER_PPG = L_PER_US_GAL / KG_PER_LB;

/** A fermentable's potential in gravity points · litre per kilogram at 100 % efficiency. */
export function potentialPointLitresPerKg(potential: FermentablePotential, field = 'potential'): number {
  const ppg =
    'ppg' in potential
      ? requireInRange(potential.ppg, `${field}.ppg`, 0, SUCROSE_PPG, 'PPG')
      : extractPctToPpg(potential.extractPct, `${field}.extractPct`);
  return ppg * POINT_L_PER_KG_PER_PPG;
}

/** Efficiency that applies to a stage: brewhouse efficiency in the mash, 100 % otherwise. */
export function stageEfficiency(stage: FermentableStage, brewhouseEfficiency: number): number {
  return stage === 'mash' ? brewhouseEfficiency : 1;
}

/** A fermentable for gravity purposes. */
export interface GravitySource {
  weightKg: number;
  potential: FermentablePotential;
  stage: FermentableStage;
}

/**
 * Gravity points·L each fermentable delivers into the fermenter.
 * Points = kg × potential (pt·L/kg) × efficiency (mash stage only).
 */
export function pointLitres(
  items: readonly GravitySource[],
  brewhouseEfficiency: number,
  field = 'fermentables',
): number[] {
  requireEfficiency(brewhouseEfficiency, 'brewhouseEfficiency', 'Brewhouse efficiency');
  return items.map((item, i) => {
    requireNonNegative(item.weightKg, `${field}.${i}.weightKg`, 'Weight');
    return item.weightKg * potentialPointLitres(item, `${field}.${i}.potential`, brewhouseEfficiency);
  });
}

function potentialPointLitres(item: GravitySource, field: string, brewhouseEfficiency: number): number {
  return potentialPointLitresPerKg(item.potential, field) * stageEfficiency(item.stage, brewhouseEfficiency);
}

/**
 * OG from fermentables: points = Σ(kg × pt·L/kg × efficiency) / volume
 * (the standard extract-potential method; efficiency is brewhouse efficiency
 * into the fermenter, kettle and fermenter additions at 100 %).
 * @param volumeL volume into the fermenter, L
 * @returns specific gravity
 */
export function ogFromFermentables(
  items: readonly GravitySource[],
  brewhouseEfficiency: number,
  volumeL: number,
): number {
  requirePositive(volumeL, 'volumeL', 'Volume');
  const total = pointLitres(items, brewhouseEfficiency).reduce((a, b) => a + b, 0);
  const og = 1 + total / volumeL / 1000;
  if (og > MAX_SG) {
    throw new BrewingInputError(
      'fermentables',
      `These fermentables give an OG of ${og.toFixed(3)}, above the 1.200 the formulas cover.`,
    );
  }
  return og;
}

/** FG from OG and apparent attenuation (% of gravity points consumed). */
export function fgFromAttenuation(og: number, attenuationPct: number): number {
  requireGravity(og, 'og', 'OG');
  requireInRange(attenuationPct, 'attenuationPct', 0, 100, 'Attenuation %');
  return 1 + (og - 1) * (1 - attenuationPct / 100);
}

function requireOgFg(og: number, fg: number): void {
  requireGravity(og, 'og', 'OG');
  requireGravity(fg, 'fg', 'FG');
  if (fg > og) throw new BrewingInputError('fg', 'FG cannot be higher than OG.');
}

/** Simple rule of thumb: ABV % = (OG − FG) × 131.25 (homebrewing rule, common practice). */
export function abvSimple(og: number, fg: number): number {
  requireOgFg(og, fg);
  return (og - fg) * 131.25;
}

/** Real extract, °P. Balling (via M. L. Hall, "Brew by the Numbers", Zymurgy 1995): RE = 0.1808·OE + 0.8192·AE, all °P. */
export function realExtractPlato(og: number, fg: number): number {
  requireOgFg(og, fg);
  return 0.1808 * platoFromSg(og) + 0.8192 * platoFromSg(fg);
}

/**
 * ABV by Balling's route. ABW = (OE − RE)/(2.0665 − 0.010665·OE) (°P in, % w/w out),
 * then ABV = ABW × FG / 0.794 (ethanol SG 0.794); as given by M. L. Hall, Zymurgy 1995.
 */
export function abvBalling(og: number, fg: number): number {
  const re = realExtractPlato(og, fg);
  const oe = platoFromSg(og);
  const abw = (oe - re) / (2.0665 - 0.010665 * oe);
  return (abw * fg) / 0.794;
}

/** ABV = (76.08·(OG − FG)/(1.775 − OG))·(FG/0.794), SG in, % v/v out (attributed to M. L. Hall, Zymurgy 1995; from memory). */
export function abvHall(og: number, fg: number): number {
  requireOgFg(og, fg);
  return ((76.08 * (og - fg)) / (1.775 - og)) * (fg / 0.794);
}

/** The ABV formulas on offer. */
export type AbvMethod = 'simple' | 'balling' | 'hall';

/** The formula the UI shows as "ABV". The others stay available for comparison. */
export const ABV_METHOD_SHOWN: AbvMethod = 'balling';

/** ABV %, by {@link ABV_METHOD_SHOWN} unless another method is named. */
export function abv(og: number, fg: number, method: AbvMethod = ABV_METHOD_SHOWN): number {
  if (method === 'simple') return abvSimple(og, fg);
  if (method === 'hall') return abvHall(og, fg);
  return abvBalling(og, fg);
}

function requireFermentableOg(og: number, fg: number): void {
  requireOgFg(og, fg);
  if (og <= 1) throw new BrewingInputError('og', 'OG must be above 1.000 to compute attenuation.');
}

/** Apparent attenuation, fraction: (OG − FG)/(OG − 1) in gravity points. */
export function apparentAttenuation(og: number, fg: number): number {
  requireFermentableOg(og, fg);
  return (og - fg) / (og - 1);
}

/** Real attenuation, fraction: (OE − RE)/OE with RE by Balling (see {@link realExtractPlato}). */
export function realAttenuation(og: number, fg: number): number {
  requireFermentableOg(og, fg);
  const oe = platoFromSg(og);
  return (oe - realExtractPlato(og, fg)) / oe;
}
