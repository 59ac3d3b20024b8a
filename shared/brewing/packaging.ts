/**
 * Packaging runs: kegs, cans and bottles, the volume they hold, and what was
 * lost between knockout and package. Volumes in litres.
 */
import { BrewingInputError, requireNonNegative, requirePositive } from './errors';
import { L_PER_US_BBL } from '../quantities/convert';

/** Keg sizes and their volume, L. US kegs are fractions of the 31-gal beer barrel (27 CFR 25.11). */
export const KEG_SIZES = {
  half_bbl: L_PER_US_BBL / 2,
  quarter_bbl: L_PER_US_BBL / 4,
  sixth_bbl: L_PER_US_BBL / 6,
  keg_20l: 20,
  keg_30l: 30,
  keg_50l: 50,
} as const;
export type KegSize = keyof typeof KEG_SIZES;
export const KEG_SIZE_IDS = Object.keys(KEG_SIZES) as KegSize[];

/** One line of a packaging run. */
export type PackageLine =
  { kind: 'keg'; size: KegSize; count: number } | { kind: 'can' | 'bottle'; sizeMl: number; count: number };

/** Beer in one line, L. */
export function lineVolumeL(line: PackageLine, field = 'line'): number {
  if (!Number.isInteger(line.count) || line.count < 0)
    throw new BrewingInputError(`${field}.count`, 'Count must be a whole number, zero or more.');
  if (line.kind === 'keg') {
    const litres = KEG_SIZES[line.size];
    if (litres === undefined) throw new BrewingInputError(`${field}.size`, `Unknown keg size "${String(line.size)}".`);
    return litres * line.count;
  }
  return (requirePositive(line.sizeMl, `${field}.sizeMl`, 'Container size (mL)') / 1000) * line.count;
}

export interface PackagingTotals {
  /** Beer in packages, L. */
  packagedL: number;
  /** Knockout volume − packaged volume, L: trub, yeast, transfers, dumps. */
  lossL: number;
  /** Loss as a fraction of knockout volume. */
  lossFraction: number;
}

/**
 * Packaged volume and losses for a batch from every line packaged so far and the
 * volume into the fermenter at knockout. Refuses more beer in packages than went in.
 */
export function packagingTotals(lines: readonly PackageLine[], knockoutL: number): PackagingTotals {
  requirePositive(knockoutL, 'knockoutL', 'Knockout volume');
  const packagedL = lines.reduce((sum, line, i) => sum + lineVolumeL(line, `lines.${i}`), 0);
  requireNonNegative(packagedL, 'lines', 'Packaged volume');
  if (packagedL > knockoutL * 1.001) {
    throw new BrewingInputError(
      'lines',
      `These packages hold ${packagedL.toFixed(1)} L, more than the ${knockoutL.toFixed(1)} L knocked out.`,
    );
  }
  const lossL = Math.max(0, knockoutL - packagedL);
  return { packagedL, lossL, lossFraction: lossL / knockoutL };
}

/** Where the packaged beer came from: the bright tank it was transferred into, or straight from the fermenter. */
export type PackagingSource = 'bright_tank' | 'fermenter';

/**
 * The loss above which a packaging loss is flagged as implausible, as a fraction of what went into the
 * tank packaged from. From a bright tank only the tank bottom, the lines and the filler's purge are lost,
 * a few percent; from a fermenter the yeast cake and trub stay behind as well (common practice, no source).
 */
export const PLAUSIBLE_PACKAGING_LOSS: Record<PackagingSource, number> = { bright_tank: 0.1, fermenter: 0.2 };

export interface PackagingLoss {
  /** What went into the tank packaged from, less what is in packages, L (0 when packages hold more). */
  lossL: number;
  /** Loss as a fraction of what went into that tank. */
  lossFraction: number;
  /** True above {@link PLAUSIBLE_PACKAGING_LOSS} for the source: worth checking the counts and volumes. */
  implausible: boolean;
}

/** The loss of a finished packaging against the volume that went into the tank it was packaged from. */
export function packagingLoss(packagedL: number, sourceL: number, source: PackagingSource): PackagingLoss {
  requirePositive(sourceL, 'sourceL', 'Volume in the tank');
  requireNonNegative(packagedL, 'packagedL', 'Packaged volume');
  const lossL = Math.max(0, sourceL - packagedL);
  const lossFraction = lossL / sourceL;
  return { lossL, lossFraction, implausible: lossFraction > PLAUSIBLE_PACKAGING_LOSS[source] };
}
