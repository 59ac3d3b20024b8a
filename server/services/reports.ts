/**
 * Production figures and batch history, read straight from the signed log and its projections:
 * knockout volumes and OG from the brew-day log (after corrections), packaging runs, gravity readings.
 * Each report is one statement that reads indexes and a handful of rows, whatever the brewery's size.
 */
import type { UnitSystem } from '../../shared/quantities';
import { QueryTypes } from 'sequelize';
import { fromZonedTime } from 'date-fns-tz';
import { sequelize } from '../config/database';
import { notFound } from '../errors';
import { readingInForce } from '../models';
import { achievedEfficiency, apparentAttenuation, lineVolumeL, type PackageLine } from '../../shared/brewing';
import type {
  BatchHistory,
  BeerFigures,
  HistoryRow,
  PackageFigures,
  ProductionReport,
} from '../../shared/schemas/reports';
import { packageName } from '../../shared/schemas/cellar';

/** The UTC instant of local midnight on the first of `year-month` in `timeZone` (month may be 13 → next year). */
export function monthStartUtc(year: number, month: number, timeZone: string): Date {
  const first = new Date(Date.UTC(year, month - 1, 1)).toISOString().slice(0, 19);
  return fromZonedTime(first, timeZone);
}

const json = <T>(v: T | string): T => (typeof v === 'string' ? (JSON.parse(v) as T) : v);

/**
 * A knockout entry's measured value after corrections, as the log's JSON text (NULL when not measured): the latest
 * correction that sets the field wins, else the entry's own value. Corrections count only for an entry that carries
 * measurements itself, as in shared/batches' effectiveMeasurements. `k` is the knockout entry's alias.
 */
const measured = (k: string, field: 'volumeL' | 'gravitySg') => `IF(JSON_EXISTS(${k}.data, '$.measurements'), COALESCE(
    (SELECT JSON_VALUE(c.data, '$.measurements.${field}') FROM batch_log_entries c
      WHERE c.corrects_entry_id = ${k}.id AND c.kind = 'correction' AND JSON_EXISTS(c.data, '$.measurements.${field}')
      ORDER BY c.id DESC LIMIT 1),
    JSON_VALUE(${k}.data, '$.measurements.${field}')), NULL)`;

/** A knockout entry (a step or measurement at 'knockout-end', alias k) and the litres it measured, after corrections. */
const KNOCKOUT_LITRES = measured('k', 'volumeL');

/** What a batch packaged before the month (alias b), for a batch in a tank at the month's end. */
const PACKAGED_BEFORE =
  '(SELECT SUM(p.packaged_l) FROM packaging_runs p WHERE p.batch_id = b.id AND p.packaged_at < :from)';

/**
 * The monthly report in one statement. Each table a statement names costs MariaDB planning time, so it names few:
 * - brewed: a knockout in the month;
 * - batches dumped since the month began, and batches open now (brewing, fermenting, conditioning), each with all
 *   its knockouts: one dumped in the month counts its first knockout as dumped; one dumped after the month's end,
 *   or open now, was still in a tank then and counts its knockouts before the end;
 * - in_tank: the knockouts before the month's end of a batch whose final packaging run came after the end, found
 *   among runs after the end of batches knocked out before it, both read from indexes alone, so a month years back
 *   costs index entries rather than rows;
 * - packaged: a packaging run in the month, with its package lines.
 * Batches that may be in a tank carry the litres they packaged before the month.
 * Exported so the benchmark can EXPLAIN it.
 */
export const PRODUCTION_SQL = `
  SELECT 'brewed' AS why, b.id AS batchId, b.beer_name AS beerName, k.id AS knockoutId, 1 AS knockedOutByEnd, ${KNOCKOUT_LITRES} AS volumeL,
         NULL AS runLines, NULL AS packagedL
    FROM batch_log_entries k JOIN batches b ON b.id = k.batch_id
   WHERE k.brewery_id = :breweryId AND k.step_key = 'knockout-end' AND k.captured_at >= :from AND k.captured_at < :to
  UNION ALL
  SELECT IF(b.status = 'dumped' AND b.dumped_at < :to, 'dumped', 'in_tank'), b.id, b.beer_name, k.id, k.captured_at < :to, ${KNOCKOUT_LITRES},
         NULL, ${PACKAGED_BEFORE}
    FROM batches b LEFT JOIN batch_log_entries k ON k.batch_id = b.id AND k.step_key = 'knockout-end'
   WHERE b.brewery_id = :breweryId AND (b.status IN ('brewing', 'fermenting', 'conditioning') OR (b.status = 'dumped' AND b.dumped_at >= :from))
  UNION ALL
  SELECT 'in_tank', b.id, b.beer_name, k.id, 1, ${KNOCKOUT_LITRES}, NULL, ${PACKAGED_BEFORE}
    FROM packaging_runs fp
    JOIN batches b ON b.id = fp.batch_id AND NOT (b.status = 'dumped' AND b.dumped_at >= :to)
    JOIN batch_log_entries fe ON fe.id = fp.log_entry_id AND JSON_VALUE(fe.data, '$.final') IN ('1', 'true')
    JOIN batch_log_entries k ON k.batch_id = b.id AND k.step_key = 'knockout-end' AND k.captured_at < :to
   WHERE fp.brewery_id = :breweryId AND fp.packaged_at >= :to
     AND fp.batch_id IN (SELECT kb.batch_id FROM batch_log_entries kb WHERE kb.brewery_id = :breweryId AND kb.step_key = 'knockout-end' AND kb.captured_at < :to)
  UNION ALL
  SELECT 'packaged', b.id, b.beer_name, NULL, NULL, NULL, p.lines, p.packaged_l
    FROM packaging_runs p JOIN batches b ON b.id = p.batch_id
   WHERE p.brewery_id = :breweryId AND p.packaged_at >= :from AND p.packaged_at < :to`;

interface ProductionRow {
  why: 'brewed' | 'dumped' | 'in_tank' | 'packaged';
  batchId: number;
  beerName: string;
  knockoutId: number | string | null;
  /** 1 when the knockout came before the month's end. */
  knockedOutByEnd: number | string | null;
  /** Knockout litres as the log's JSON text. */
  volumeL: string | null;
  runLines: PackageLine[] | string | null;
  /** A run's litres; for a batch that may be in a tank, what it packaged before the month. */
  packagedL: number | null;
}

/** The month's bounds in the brewery's time zone. */
function monthBounds(month: string, timeZone: string): { from: Date; to: Date } {
  const [year, mon] = month.split('-').map(Number) as [number, number];
  return { from: monthStartUtc(year, mon, timeZone), to: monthStartUtc(year, mon + 1, timeZone) };
}

export async function productionReport(
  brewery: { id: number; timeZone: string },
  month: string,
): Promise<ProductionReport> {
  const { from, to } = monthBounds(month, brewery.timeZone);
  const rows = await sequelize.query<ProductionRow>(PRODUCTION_SQL, {
    replacements: { breweryId: brewery.id, from, to },
    type: QueryTypes.SELECT,
  });

  const beers = new Map<string, BeerFigures>();
  const beer = (name: string) => {
    if (!beers.has(name)) beers.set(name, { beerName: name, brewedL: 0, packagedL: 0, dumpedL: 0, inTankL: 0 });
    return beers.get(name)!;
  };
  const litres = (r: ProductionRow) => (r.volumeL === null ? 0 : Number(r.volumeL));
  const inTank = rows.filter((r) => r.why === 'in_tank' && r.knockoutId !== null && Number(r.knockedOutByEnd) === 1);
  // A batch dumped in the month counts its first knockout.
  const dumped = new Map<number, ProductionRow>();
  for (const r of rows) {
    if (r.why !== 'dumped') continue;
    const first = dumped.get(r.batchId);
    if (
      !first ||
      (r.knockoutId !== null && (first.knockoutId === null || Number(r.knockoutId) < Number(first.knockoutId)))
    )
      dumped.set(r.batchId, r);
  }

  // What each batch had packaged by the month's end: its runs in the month, and for a batch in a tank, before it.
  const packagedBefore = new Map<number, number>();
  const addPackaged = (batchId: number, l: number) =>
    packagedBefore.set(batchId, (packagedBefore.get(batchId) ?? 0) + l);
  for (const r of new Map(inTank.map((r) => [r.batchId, r])).values())
    if (r.packagedL !== null) addPackaged(r.batchId, Number(r.packagedL));
  const packages = new Map<string, PackageFigures>();
  for (const r of rows) {
    if (r.why !== 'packaged') continue;
    addPackaged(r.batchId, Number(r.packagedL));
    for (const line of json(r.runLines!)) {
      const size = line.kind === 'keg' ? line.size : String(line.sizeMl);
      const key = `${r.beerName}\u0000${line.kind}\u0000${size}`;
      const p = packages.get(key) ?? { beerName: r.beerName, kind: line.kind, size, count: 0, volumeL: 0 };
      p.count += line.count;
      p.volumeL += lineVolumeL(line);
      packages.set(key, p);
      beer(r.beerName).packagedL += lineVolumeL(line);
    }
  }

  for (const r of rows) if (r.why === 'brewed') beer(r.beerName).brewedL += litres(r);
  // A dumped batch loses what was still in the tank: its knockout volume less anything packaged before.
  for (const r of dumped.values())
    beer(r.beerName).dumpedL += Math.max(0, litres(r) - (packagedBefore.get(r.batchId) ?? 0));
  for (const r of inTank) beer(r.beerName).inTankL += Math.max(0, litres(r) - (packagedBefore.get(r.batchId) ?? 0));
  const list = [...beers.values()].sort((a, b) => a.beerName.localeCompare(b.beerName));
  const totals = list.reduce(
    (t, b) => ({
      brewedL: t.brewedL + b.brewedL,
      packagedL: t.packagedL + b.packagedL,
      dumpedL: t.dumpedL + b.dumpedL,
      inTankL: t.inTankL + b.inTankL,
    }),
    { brewedL: 0, packagedL: 0, dumpedL: 0, inTankL: 0 },
  );
  return {
    month,
    timeZone: brewery.timeZone,
    from: from.toISOString(),
    to: to.toISOString(),
    beers: list,
    packages: [...packages.values()].sort(
      (a, b) => a.beerName.localeCompare(b.beerName) || a.kind.localeCompare(b.kind) || a.size.localeCompare(b.size),
    ),
    totals,
  };
}

/** The EXPLAIN plan of the report's statement (for the benchmark's output). */
export async function explainProductionReport(breweryId: number, month: string): Promise<string[]> {
  const rows = await sequelize.query<{
    id: number;
    select_type: string;
    table: string | null;
    type: string | null;
    key: string | null;
    rows: number | null;
    Extra: string | null;
  }>(`EXPLAIN ${PRODUCTION_SQL}`, {
    replacements: { breweryId, ...monthBounds(month, 'UTC') },
    type: QueryTypes.SELECT,
  });
  return rows.map(
    (r) => `${r.id} ${r.select_type} ${r.table} type=${r.type} key=${r.key ?? '-'} rows=${r.rows} ${r.Extra ?? ''}`,
  );
}

/**
 * A recipe's latest batches, newest first, planned against actual, in one statement: a first row with the recipe's
 * name (none when the recipe is not the brewery's), then the batches in index order. Each batch's first knockout
 * gives the measured OG and litres (after corrections), its latest gravity reading the FG, its first packaging run
 * the packaging day.
 */
const HISTORY_SQL = `
  (SELECT r.name AS recipeName, NULL AS id, NULL AS number, NULL AS brewDate, NULL AS status, NULL AS plannedOg,
          NULL AS plannedEfficiency, NULL AS plannedKnockoutL, NULL AS measured, NULL AS lastSg, NULL AS firstPackagedAt
     FROM recipes r WHERE r.id = :recipeId AND r.brewery_id = :breweryId)
  UNION ALL
  (SELECT NULL, b.id, b.number, b.brew_date, b.status, b.planned_og, b.planned_efficiency, b.planned_knockout_l,
          (SELECT JSON_ARRAY(${measured('k', 'gravitySg')}, ${measured('k', 'volumeL')})
             FROM batch_log_entries k WHERE k.batch_id = b.id AND k.step_key = 'knockout-end' ORDER BY k.id LIMIT 1),
          (SELECT g.sg FROM gravity_readings g WHERE g.batch_id = b.id AND ${readingInForce('g')} ORDER BY g.taken_at DESC, g.id DESC LIMIT 1),
          (SELECT MIN(p.packaged_at) FROM packaging_runs p WHERE p.batch_id = b.id)
     FROM batches b
    WHERE b.brewery_id = :breweryId AND b.recipe_id = :recipeId
    ORDER BY b.brew_date DESC, b.id DESC
    LIMIT :limit)`;

interface HistorySqlRow {
  recipeName: string | null;
  id: number | null;
  number: string;
  brewDate: string;
  status: string;
  plannedOg: number;
  /** From the frozen plan (stored generated columns). */
  plannedEfficiency: number | null;
  plannedKnockoutL: number | null;
  /** [OG, knockout litres] measured at the first knockout, each as the log's JSON text or null; null without a knockout. */
  measured: [string | null, string | null] | string | null;
  lastSg: number | null;
  firstPackagedAt: Date | string | null;
}

/** The latest `limit` batches of a recipe, planned against actual, newest first. */
export async function batchHistory(breweryId: number, recipeId: number, limit: number): Promise<BatchHistory> {
  const found = await sequelize.query<HistorySqlRow>(HISTORY_SQL, {
    replacements: { breweryId, recipeId, limit },
    type: QueryTypes.SELECT,
  });
  const recipe = found.find((r) => r.id === null);
  if (!recipe) throw notFound('This recipe');
  const rows: HistoryRow[] = found
    .filter((b) => b.id !== null)
    .sort((a, b) => (a.brewDate === b.brewDate ? b.id! - a.id! : a.brewDate < b.brewDate ? 1 : -1))
    .map((b) => {
      const [ogText, volumeText] = b.measured === null ? [null, null] : json(b.measured);
      const og = ogText === null ? null : Number(ogText);
      const volumeL = volumeText === null ? null : Number(volumeText);
      const plannedEfficiency = Number(b.plannedEfficiency);
      const fg = b.lastSg;
      const packagedAt = b.firstPackagedAt ? new Date(b.firstPackagedAt) : null;
      return {
        batchId: b.id!,
        number: b.number,
        brewDate: String(b.brewDate),
        status: b.status,
        plannedOg: b.plannedOg,
        actualOg: og,
        plannedEfficiency,
        actualEfficiency:
          og !== null && volumeL !== null
            ? achievedEfficiency({
                plannedEfficiency,
                plannedOg: b.plannedOg,
                plannedVolumeL: Number(b.plannedKnockoutL),
                actualOg: og,
                actualVolumeL: volumeL,
              })
            : null,
        apparentAttenuation: og !== null && fg !== null && fg < og ? apparentAttenuation(og, fg) : null,
        daysBrewToPackage: packagedAt
          ? Math.floor((packagedAt.getTime() - Date.parse(`${b.brewDate}T00:00:00Z`)) / 86_400_000)
          : null,
      };
    });
  return { recipeId, recipeName: recipe.recipeName!, rows };
}

/** The monthly report as CSV: one line per beer and a total, in litres, US barrels and hectolitres; then packages. */
export function productionCsv(
  report: ProductionReport,
  convert: { bbl: (l: number) => number; hl: (l: number) => number },
  system: UnitSystem,
): string {
  const cell = (v: string | number) => {
    const s = typeof v === 'number' ? String(Math.round(v * 100) / 100) : v;
    // Quote every text cell, and neutralise leading formula characters for spreadsheets.
    return typeof v === 'number' ? s : `"${(/^[=+\-@\t\r]/.test(s) ? `'${s}` : s).replace(/"/g, '""')}"`;
  };
  const figures = ['brewedL', 'packagedL', 'dumpedL', 'inTankL'] as const;
  const head = [
    'Beer',
    ...figures.flatMap((f) => {
      const label = { brewedL: 'Brewed', packagedL: 'Packaged', dumpedL: 'Dumped', inTankL: 'In tanks at month end' }[
        f
      ];
      return [`${label} (L)`, `${label} (US bbl)`, `${label} (hL)`];
    }),
  ];
  const line = (name: string, b: Omit<BeerFigures, 'beerName'>) =>
    [cell(name), ...figures.flatMap((f) => [cell(b[f]), cell(convert.bbl(b[f])), cell(convert.hl(b[f]))])].join(',');
  const lines = [
    cell(
      `Kettlewright monthly production ${report.month} (${report.timeZone}). Official forms differ by country: these figures help prepare them.`,
    ),
    head.map(cell).join(','),
    ...report.beers.map((b) => line(b.beerName, b)),
    line('Total', report.totals),
    '',
    ['Beer', 'Package', 'Count', 'Volume (L)', 'Volume (US bbl)', 'Volume (hL)'].map(cell).join(','),
    ...report.packages.map((p) =>
      [
        cell(p.beerName),
        cell(packageName(system, p.kind, p.size)),
        cell(p.count),
        cell(p.volumeL),
        cell(convert.bbl(p.volumeL)),
        cell(convert.hl(p.volumeL)),
      ].join(','),
    ),
  ];
  return `${lines.join('\r\n')}\r\n`;
}
