/** Beer colour: malt colour units, Morey's SRM, EBC and a display swatch. */
import { BrewingInputError, requireFinite, requireNonNegative, requirePositive } from './errors';
import { EBC_PER_SRM, kgToLb, lToUsGal } from '../quantities/convert';

/** A coloured ingredient. */
export interface ColourSource {
  weightKg: number;
  colourLovibond: number;
}

/** Malt colour units: MCU = Σ(lb × °L) / US gal (the standard homebrew definition). */
export function maltColourUnits(items: readonly ColourSource[], volumeL: number, field = 'fermentables'): number {
  requirePositive(volumeL, 'volumeL', 'Volume');
  let sum = 0;
  items.forEach((item, i) => {
    const lb = kgToLb(requireNonNegative(item.weightKg, `${field}.${i}.weightKg`, 'Weight'));
    sum += lb * requireNonNegative(item.colourLovibond, `${field}.${i}.colourLovibond`, 'Colour (°L)');
  });
  return sum / lToUsGal(volumeL);
}

/** Morey's equation: SRM = 1.4922 × MCU^0.6859 (D. Morey, "Approximating Beer Color"; citation from memory), MCU in lb·°L/gal. */
export function moreySrm(mcu: number): number {
  requireNonNegative(mcu, 'mcu', 'MCU');
  return 1.4922 * Math.pow(mcu, 0.6859);
}

/** SRM of a grain bill in a volume (MCU then Morey). */
export function srmFromFermentables(items: readonly ColourSource[], volumeL: number): number {
  return moreySrm(maltColourUnits(items, volumeL));
}

/** EBC = SRM × {@link EBC_PER_SRM}. */
export function srmToEbc(srm: number): number {
  return requireNonNegative(srm, 'srm', 'SRM') * EBC_PER_SRM;
}

/** SRM = EBC / {@link EBC_PER_SRM}. */
export function ebcToSrm(ebc: number): number {
  return requireNonNegative(ebc, 'ebc', 'EBC') / EBC_PER_SRM;
}

/** sRGB colour, 0–255 per channel. */
export interface Rgb {
  r: number;
  g: number;
  b: number;
}

/**
 * Swatch anchors, SRM → sRGB. Source: our own approximation of the SRM colour
 * spectrum, chosen by eye from memory (pale straw → gold → amber → brown →
 * black); for swatches only, not for measurement. Between anchors we
 * interpolate linearly; above the last anchor the colour stays at black.
 */
const SRM_SWATCH_ANCHORS: ReadonlyArray<readonly [number, Rgb]> = [
  [0, { r: 255, g: 244, b: 200 }],
  [2, { r: 250, g: 222, b: 120 }],
  [4, { r: 242, g: 190, b: 70 }],
  [6, { r: 232, g: 164, b: 40 }],
  [9, { r: 214, g: 128, b: 22 }],
  [12, { r: 192, g: 98, b: 16 }],
  [16, { r: 160, g: 70, b: 14 }],
  [20, { r: 128, g: 48, b: 12 }],
  [26, { r: 96, g: 32, b: 10 }],
  [33, { r: 62, g: 20, b: 8 }],
  [40, { r: 36, g: 12, b: 6 }],
];

/** SRM → swatch colour (see the anchor table's note on its source). */
export function srmToRgb(srm: number): Rgb {
  requireFinite(srm, 'srm', 'SRM');
  if (srm < 0) throw new BrewingInputError('srm', 'SRM cannot be negative.');
  const last = SRM_SWATCH_ANCHORS[SRM_SWATCH_ANCHORS.length - 1]!;
  if (srm >= last[0]) return { ...last[1] };
  let i = 1;
  while (SRM_SWATCH_ANCHORS[i]![0] < srm) i++;
  const [s0, c0] = SRM_SWATCH_ANCHORS[i - 1]!;
  const [s1, c1] = SRM_SWATCH_ANCHORS[i]!;
  const t = (srm - s0) / (s1 - s0);
  const mix = (a: number, b: number): number => Math.round(a + (b - a) * t);
  return { r: mix(c0.r, c1.r), g: mix(c0.g, c1.g), b: mix(c0.b, c1.b) };
}

/** SRM → `#rrggbb` swatch colour. */
export function srmToHex(srm: number): string {
  const { r, g, b } = srmToRgb(srm);
  return `#${[r, g, b].map((c) => c.toString(16).padStart(2, '0')).join('')}`;
}
