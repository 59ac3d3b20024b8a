/**
 * Production figures and batch history. Volumes travel in litres; screens and CSV convert to US barrels
 * and hectolitres with shared/brewing's units.
 */
import { z } from 'zod';

export const monthParam = z
  .string({ error: 'Choose a month' })
  .regex(/^(19|20)\d\d-(0[1-9]|1[0-2])$/, 'Choose a month as YYYY-MM');

export const productionQuery = z.strictObject({ month: monthParam });
export type ProductionQuery = z.infer<typeof productionQuery>;

export const HISTORY_MAX = 200;
export const historyQuery = z.strictObject({
  recipeId: z.coerce.number({ error: 'Choose a recipe' }).int().positive().max(2147483647),
  limit: z.coerce.number().int().min(1).max(HISTORY_MAX).default(60),
});
export type HistoryQuery = z.infer<typeof historyQuery>;

/** One beer's month: litres brewed (knockout), packaged, dumped, and in tanks at the month's end. */
export interface BeerFigures {
  beerName: string;
  brewedL: number;
  packagedL: number;
  dumpedL: number;
  inTankL: number;
}

/** Packaged volume of one beer in one kind and size of package. */
export interface PackageFigures {
  beerName: string;
  kind: 'keg' | 'can' | 'bottle';
  /** Keg size id (half_bbl…) or container size in mL. */
  size: string;
  count: number;
  volumeL: number;
}

export interface ProductionReport {
  month: string;
  timeZone: string;
  /** The month's first and last instants in the brewery's time zone, ISO UTC. */
  from: string;
  to: string;
  beers: BeerFigures[];
  packages: PackageFigures[];
  totals: Omit<BeerFigures, 'beerName'>;
}

/** One batch of a recipe, planned against actual. Null where the log does not hold the measurement yet. */
export interface HistoryRow {
  batchId: number;
  number: string;
  brewDate: string;
  status: string;
  plannedOg: number;
  actualOg: number | null;
  plannedEfficiency: number;
  actualEfficiency: number | null;
  /** Apparent attenuation from the measured OG and the latest gravity reading, fraction 0–1. */
  apparentAttenuation: number | null;
  daysBrewToPackage: number | null;
}

export interface BatchHistory {
  recipeId: number;
  recipeName: string;
  rows: HistoryRow[];
}
