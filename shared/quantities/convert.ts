/**
 * Unit constants and conversions, the one home of every factor the product uses. Everything stored and
 * sent is SI (kg, g, L, °C, kPa gauge); these convert at the edges for US-unit brewers. The quantities
 * table (./index.ts) binds them to each quantity's display units.
 */

/** NIST Handbook 44 Appendix C and NIST SP 811 Appendix B.8: 1 lb (avoirdupois) = 0.453 592 37 kg exactly. */
export const KG_PER_LB = 0.45359237;
/** NIST Handbook 44 Appendix C: 1 oz (avoirdupois) = 1/16 lb = 28.349 523 125 g exactly. */
export const G_PER_OZ = (KG_PER_LB * 1000) / 16;
/** NIST Handbook 44 Appendix C: 1 US gallon = 231 in³ = 3.785 411 784 L exactly. */
export const L_PER_US_GAL = 3.785411784;
/** NIST Handbook 44 Appendix C: 1 US liquid quart = 1/4 US gallon. */
export const L_PER_US_QT = L_PER_US_GAL / 4;
/** US beer barrel = 31 US gallons (27 CFR 25.11, the US beer excise definition). */
export const US_GAL_PER_US_BBL = 31;
/** 1 US beer barrel in litres (31 × 3.785 411 784 L). */
export const L_PER_US_BBL = US_GAL_PER_US_BBL * L_PER_US_GAL;
/** NIST Handbook 44 Appendix C: 1 US teaspoon = 1/3 tablespoon = 1/6 fluid ounce = 1/768 US gallon. */
export const ML_PER_US_TSP = (L_PER_US_GAL * 1000) / 768;
/** 1 hectolitre = 100 L (SI prefix hecto, NIST SP 811 §4). */
export const L_PER_HL = 100;
/** NIST SP 811 Appendix B.8: 1 psi = 1 lbf/in² = 6.894 757 kPa; derived from lb, standard gravity 9.806 65 m/s² and 1 in = 0.0254 m exactly. */
export const KPA_PER_PSI = (KG_PER_LB * 9.80665) / (0.0254 * 0.0254) / 1000;
/** 1 US qt/lb expressed in L/kg (≈ 2.086), for mash thickness conversions. */
const L_PER_KG_PER_QT_PER_LB = L_PER_US_QT / KG_PER_LB;

/** Pounds → kilograms. */
export const lbToKg = (lb: number): number => lb * KG_PER_LB;
/** Kilograms → pounds. */
export const kgToLb = (kg: number): number => kg / KG_PER_LB;
/** Ounces (avoirdupois) → grams. */
export const ozToG = (oz: number): number => oz * G_PER_OZ;
/** Grams → ounces (avoirdupois). */
export const gToOz = (g: number): number => g / G_PER_OZ;
/** US gallons → litres. */
export const usGalToL = (gal: number): number => gal * L_PER_US_GAL;
/** Litres → US gallons. */
export const lToUsGal = (l: number): number => l / L_PER_US_GAL;
/** US quarts → litres. */
export const usQtToL = (qt: number): number => qt * L_PER_US_QT;
/** Litres → US quarts. */
export const lToUsQt = (l: number): number => l / L_PER_US_QT;
/** US beer barrels (31 US gal) → litres. */
export const usBblToL = (bbl: number): number => bbl * L_PER_US_BBL;
/** Litres → US beer barrels (31 US gal). */
export const lToUsBbl = (l: number): number => l / L_PER_US_BBL;
/** Hectolitres → litres. */
export const hlToL = (hl: number): number => hl * L_PER_HL;
/** Litres → hectolitres. */
export const lToHl = (l: number): number => l / L_PER_HL;
/** US teaspoons → millilitres. */
export const tspToMl = (tsp: number): number => tsp * ML_PER_US_TSP;
/** Millilitres → US teaspoons. */
export const mlToTsp = (ml: number): number => ml / ML_PER_US_TSP;
/** psi → kPa (gauge stays gauge). */
export const psiToKpa = (psi: number): number => psi * KPA_PER_PSI;
/** kPa → psi (gauge stays gauge). */
export const kpaToPsi = (kpa: number): number => kpa / KPA_PER_PSI;
/** NIST SP 811 §B.9: t/°C = (t/°F − 32)/1.8. */
export const fToC = (f: number): number => (f - 32) / 1.8;
/** NIST SP 811 §B.9: t/°F = 1.8·t/°C + 32. */
export const cToF = (c: number): number => c * 1.8 + 32;
/** A temperature difference in °F → the same difference in °C (no offset). */
export const deltaFToC = (df: number): number => df / 1.8;
/** Mash thickness in US qt/lb → L/kg. */
export const qtPerLbToLPerKg = (r: number): number => r * L_PER_KG_PER_QT_PER_LB;
/** Mash thickness or absorption in L/kg → US qt/lb. */
export const lPerKgToQtPerLb = (r: number): number => r / L_PER_KG_PER_QT_PER_LB;
/** Absorption in US gal/lb → L/kg. */
export const galPerLbToLPerKg = (r: number): number => (r * L_PER_US_GAL) / KG_PER_LB;

/** NIST Handbook 44 Appendix C: 1 US fluid ounce = 1/128 US gallon = 29.573 529 562 5 mL. */
export const ML_PER_US_FL_OZ = (L_PER_US_GAL * 1000) / 128;
/** US fluid ounces → millilitres. */
export const flOzToMl = (floz: number): number => floz * ML_PER_US_FL_OZ;
/** Millilitres → US fluid ounces. */
export const mlToFlOz = (ml: number): number => ml / ML_PER_US_FL_OZ;

/** ASBC Methods of Analysis (Beer-2 / extract table fit): °P = −616.868 + 1111.14·SG − 630.272·SG² + 135.997·SG³. */
export function platoFromSg(sg: number): number {
  return -616.868 + sg * (1111.14 + sg * (-630.272 + sg * 135.997));
}

/** Derivative of the ASBC polynomial, d°P/dSG (positive over 0.98–1.20). */
export function platoSlope(sg: number): number {
  return 1111.14 + sg * (-1260.544 + sg * 407.991);
}

/**
 * °Plato → specific gravity. We invert the same ASBC polynomial numerically (Newton's method) so that
 * SG → °P → SG round-trips exactly; the common closed form SG = 1 + P/(258.6 − (P/258.2)·227.1) only seeds
 * the iteration. Range checks belong to the caller (shared/brewing/gravity.ts, the quantities table).
 */
export function sgFromPlato(plato: number): number {
  let sg = 1 + plato / (258.6 - (plato / 258.2) * 227.1);
  for (let i = 0; i < 8; i++) {
    const step = (platoFromSg(sg) - plato) / platoSlope(sg);
    sg -= step;
    if (Math.abs(step) < 1e-13) break;
  }
  return sg;
}

/** EBC per SRM: both scale absorbance at 430 nm (SRM = 12.7·A430, ASBC Beer-10; EBC = 25·A430, EBC Analytica), 25/12.7 ≈ 1.97. */
export const EBC_PER_SRM = 1.97;
