/**
 * Production figures and batch history, read straight from the signed log and its projections:
 * knockout volumes and OG from the brew-day log (after corrections), packaging runs, gravity readings.
 * Each report is a fixed handful of indexed queries, whatever the brewery's size.
 */
import { QueryTypes } from 'sequelize';
import { sequelize } from '../config/database';
import { Brewery, Recipe } from '../models';
import { notFound } from '../errors';
import { achievedEfficiency, apparentAttenuation, lineVolumeL, type PackageLine } from '../../shared/brewing';
import { effectiveMeasurements } from '../../shared/batches/brew-day';
import type { BatchHistory, BeerFigures, HistoryRow, PackageFigures, ProductionReport } from '../../shared/schemas/reports';

/** The UTC instant of local midnight on the first of `year-month` in `timeZone` (month may be 13 → next year). */
export function monthStartUtc(year: number, month: number, timeZone: string): Date {
  const guess = Date.UTC(year, month - 1, 1);
  // The zone's offset at that moment, read back through Intl (no time-zone tables needed in MariaDB).
  const parts = Object.fromEntries(
    new Intl.DateTimeFormat('en-US', { timeZone, hourCycle: 'h23', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit' })
      .formatToParts(new Date(guess))
      .map((p) => [p.type, p.value]),
  );
  const asLocal = Date.UTC(Number(parts.year), Number(parts.month) - 1, Number(parts.day), Number(parts.hour), Number(parts.minute), Number(parts.second));
  return new Date(guess - (asLocal - guess));
}

interface EntryRow {
  id: number;
  kind: string;
  step_key: string | null;
  data: Record<string, unknown> | string;
  corrects_entry_id: number | null;
}

const json = <T>(v: T | string): T => (typeof v === 'string' ? (JSON.parse(v) as T) : v);

/** Knockout litres and OG per knockout entry id, after corrections. */
async function knockouts(entryIds: number[]): Promise<Map<number, { volumeL?: number; gravitySg?: number }>> {
  if (!entryIds.length) return new Map();
  const rows = await sequelize.query<EntryRow>(
    // Two index lookups (primary key; corrects_entry_id) rather than one OR, which MariaDB may answer with a scan.
    `SELECT id, kind, step_key, data, corrects_entry_id FROM batch_log_entries WHERE id IN (:ids)
     UNION ALL
     SELECT id, kind, step_key, data, corrects_entry_id FROM batch_log_entries WHERE corrects_entry_id IN (:ids)
     ORDER BY id`,
    { replacements: { ids: entryIds }, type: QueryTypes.SELECT },
  );
  const effective = effectiveMeasurements(
    rows.map((r) => ({ id: Number(r.id), kind: r.kind, stepKey: r.step_key, data: json(r.data), correctsEntryId: r.corrects_entry_id === null ? null : Number(r.corrects_entry_id) })),
  );
  return new Map([...effective].map(([id, e]) => [id, e.measurements]));
}

/**
 * The report's batch query: every batch that counts in the month, tagged by why — knocked out in the month,
 * dumped in the month, or still in a tank at its end. A batch was in a tank at the month's end when it was
 * knocked out before then and had not finished: it is still open now (brewing, fermenting, conditioning), or it
 * was dumped or had its final packaging run after the end. Starting from those keeps the work proportional to
 * what happened since the month, not to the brewery's whole history. Exported so the benchmark can EXPLAIN it.
 */
export const PRODUCTION_BATCHES_SQL = `
  SELECT 'brewed' AS why, k.batch_id AS batchId, b.beer_name AS beerName, k.id AS knockoutId
    FROM batch_log_entries k JOIN batches b ON b.id = k.batch_id
   WHERE k.brewery_id = :breweryId AND k.step_key = 'knockout-end' AND k.captured_at >= :from AND k.captured_at < :to
  UNION ALL
  SELECT 'dumped', b.id, b.beer_name, (SELECT MIN(k.id) FROM batch_log_entries k WHERE k.batch_id = b.id AND k.step_key = 'knockout-end')
    FROM batches b
   WHERE b.brewery_id = :breweryId AND b.status = 'dumped' AND b.updated_at >= :from AND b.updated_at < :to
  UNION ALL
  SELECT 'in_tank', k.batch_id, b.beer_name, k.id
    FROM (
      SELECT id FROM batches WHERE brewery_id = :breweryId AND status IN ('brewing', 'fermenting', 'conditioning')
      UNION
      SELECT id FROM batches WHERE brewery_id = :breweryId AND status = 'dumped' AND updated_at >= :to
      UNION
      SELECT p.batch_id FROM packaging_runs p JOIN batch_log_entries pe ON pe.id = p.log_entry_id
       WHERE p.brewery_id = :breweryId AND p.packaged_at >= :to AND JSON_VALUE(pe.data, '$.final') IN ('1', 'true')
    ) still_open
    JOIN batches b ON b.id = still_open.id
    JOIN batch_log_entries k ON k.batch_id = b.id AND k.step_key = 'knockout-end'
   WHERE k.captured_at < :to`;

/** Packaging runs in the month, and runs before the month's end of batches still in a tank (partly packaged). */
export const PRODUCTION_PACKAGING_SQL = `
  SELECT IF(p.packaged_at >= :from, 'in_month', 'earlier') AS why, p.batch_id AS batchId, b.beer_name AS beerName, p.lines, p.packaged_l AS packagedL
    FROM packaging_runs p JOIN batches b ON b.id = p.batch_id
   WHERE p.brewery_id = :breweryId AND p.packaged_at < :to AND (p.packaged_at >= :from OR p.batch_id IN (:inTank))`;

export async function productionReport(breweryId: number, month: string): Promise<ProductionReport> {
  const brewery = await Brewery.findByPk(breweryId, { attributes: ['timeZone'] });
  if (!brewery) throw notFound('This brewery');
  const [year, mon] = month.split('-').map(Number) as [number, number];
  const from = monthStartUtc(year, mon, brewery.timeZone);
  const to = monthStartUtc(year, mon + 1, brewery.timeZone);

  const batches = await sequelize.query<{ why: 'brewed' | 'dumped' | 'in_tank'; batchId: number; beerName: string; knockoutId: number | null }>(
    PRODUCTION_BATCHES_SQL,
    { replacements: { breweryId, from, to }, type: QueryTypes.SELECT },
  );
  const inTank = batches.filter((b) => b.why === 'in_tank').map((b) => b.batchId);
  const [volumes, runs] = await Promise.all([
    knockouts([...new Set(batches.map((b) => b.knockoutId).filter((id): id is number => id !== null))]),
    sequelize.query<{ why: 'in_month' | 'earlier'; batchId: number; beerName: string; lines: PackageLine[] | string; packagedL: number }>(
      PRODUCTION_PACKAGING_SQL,
      { replacements: { breweryId, from, to, inTank: inTank.length ? inTank : [0] }, type: QueryTypes.SELECT },
    ),
  ]);

  const beers = new Map<string, BeerFigures>();
  const beer = (name: string) => {
    if (!beers.has(name)) beers.set(name, { beerName: name, brewedL: 0, packagedL: 0, dumpedL: 0, inTankL: 0 });
    return beers.get(name)!;
  };
  const knockoutL = (id: number | null) => (id === null ? 0 : (volumes.get(id)?.volumeL ?? 0));
  const packagedBefore = new Map<number, number>();
  for (const r of runs) packagedBefore.set(r.batchId, (packagedBefore.get(r.batchId) ?? 0) + Number(r.packagedL));
  for (const b of batches) {
    if (b.why === 'brewed') beer(b.beerName).brewedL += knockoutL(b.knockoutId);
    // A dumped batch loses what was still in the tank: its knockout volume less anything packaged before.
    if (b.why === 'dumped') beer(b.beerName).dumpedL += Math.max(0, knockoutL(b.knockoutId) - (packagedBefore.get(b.batchId) ?? 0));
    if (b.why === 'in_tank') beer(b.beerName).inTankL += Math.max(0, knockoutL(b.knockoutId) - (packagedBefore.get(b.batchId) ?? 0));
  }
  const packages = new Map<string, PackageFigures>();
  for (const r of runs.filter((x) => x.why === 'in_month')) {
    for (const line of json(r.lines)) {
      const size = line.kind === 'keg' ? line.size : String(line.sizeMl);
      const key = `${r.beerName}\u0000${line.kind}\u0000${size}`;
      const p = packages.get(key) ?? { beerName: r.beerName, kind: line.kind, size, count: 0, volumeL: 0 };
      p.count += line.count;
      p.volumeL += lineVolumeL(line);
      packages.set(key, p);
      beer(r.beerName).packagedL += lineVolumeL(line);
    }
  }
  const list = [...beers.values()].sort((a, b) => a.beerName.localeCompare(b.beerName));
  const totals = list.reduce(
    (t, b) => ({ brewedL: t.brewedL + b.brewedL, packagedL: t.packagedL + b.packagedL, dumpedL: t.dumpedL + b.dumpedL, inTankL: t.inTankL + b.inTankL }),
    { brewedL: 0, packagedL: 0, dumpedL: 0, inTankL: 0 },
  );
  return {
    month,
    timeZone: brewery.timeZone,
    from: from.toISOString(),
    to: to.toISOString(),
    beers: list,
    packages: [...packages.values()].sort((a, b) => a.beerName.localeCompare(b.beerName) || a.kind.localeCompare(b.kind) || a.size.localeCompare(b.size)),
    totals,
  };
}

/** The EXPLAIN plan of the report's two queries (for the benchmark's output). */
export async function explainProductionReport(breweryId: number, month: string): Promise<string[]> {
  const [year, mon] = month.split('-').map(Number) as [number, number];
  const from = monthStartUtc(year, mon, 'UTC');
  const to = monthStartUtc(year, mon + 1, 'UTC');
  const out: string[] = [];
  for (const [name, sql] of [['batches', PRODUCTION_BATCHES_SQL], ['packaging', PRODUCTION_PACKAGING_SQL]] as const) {
    const rows = await sequelize.query<Record<string, unknown>>(`EXPLAIN ${sql}`, {
      replacements: { breweryId, from, to, inTank: [0] },
      type: QueryTypes.SELECT,
    });
    out.push(`${name}:`);
    for (const r of rows) out.push(`  ${r.id} ${r.select_type} ${r.table} type=${r.type} key=${r.key ?? '-'} rows=${r.rows} ${r.Extra ?? ''}`);
  }
  return out;
}

const HISTORY_BATCHES_SQL = `
  SELECT b.id, b.number, b.brew_date AS brewDate, b.status, b.planned_og AS plannedOg,
         JSON_VALUE(b.plan, '$.equipment.brewhouseEfficiency') AS plannedEfficiency,
         JSON_VALUE(b.plan, '$.computed.volumes.knockoutL') AS plannedKnockoutL,
         (SELECT MIN(k.id) FROM batch_log_entries k WHERE k.batch_id = b.id AND k.step_key = 'knockout-end') AS knockoutId
    FROM batches b
   WHERE b.brewery_id = :breweryId AND b.recipe_id = :recipeId
   ORDER BY b.brew_date DESC, b.id DESC
   LIMIT :limit`;

/** The latest `limit` batches of a recipe, planned against actual, newest first. */
export async function batchHistory(breweryId: number, recipeId: number, limit: number): Promise<BatchHistory> {
  const recipe = await Recipe.findOne({ where: { id: recipeId, breweryId }, attributes: ['id', 'name'] });
  if (!recipe) throw notFound('This recipe');
  const batches = await sequelize.query<{
    id: number; number: string; brewDate: string; status: string; plannedOg: number; plannedEfficiency: string; plannedKnockoutL: string; knockoutId: number | null;
  }>(HISTORY_BATCHES_SQL, { replacements: { breweryId, recipeId, limit }, type: QueryTypes.SELECT });
  const ids = batches.length ? batches.map((b) => b.id) : [0];
  const [measured, later] = await Promise.all([
    knockouts(batches.map((b) => b.knockoutId).filter((id): id is number => id !== null)),
    sequelize.query<{ batchId: number; lastSg: number | null; firstPackagedAt: Date | string | null }>(
      `SELECT b.id AS batchId,
              (SELECT r.sg FROM gravity_readings r WHERE r.batch_id = b.id ORDER BY r.taken_at DESC LIMIT 1) AS lastSg,
              (SELECT MIN(p.packaged_at) FROM packaging_runs p WHERE p.batch_id = b.id) AS firstPackagedAt
         FROM batches b WHERE b.id IN (:ids)`,
      { replacements: { ids }, type: QueryTypes.SELECT },
    ),
  ]);
  const byBatch = new Map(later.map((l) => [l.batchId, l]));
  const rows: HistoryRow[] = batches.map((b) => {
    const m = b.knockoutId === null ? undefined : measured.get(b.knockoutId);
    const og = m?.gravitySg ?? null;
    const volumeL = m?.volumeL ?? null;
    const plannedEfficiency = Number(b.plannedEfficiency);
    const l = byBatch.get(b.id);
    const fg = l?.lastSg ?? null;
    const packagedAt = l?.firstPackagedAt ? new Date(l.firstPackagedAt) : null;
    return {
      batchId: b.id,
      number: b.number,
      brewDate: String(b.brewDate),
      status: b.status,
      plannedOg: b.plannedOg,
      actualOg: og,
      plannedEfficiency,
      actualEfficiency:
        og !== null && volumeL !== null
          ? achievedEfficiency({ plannedEfficiency, plannedOg: b.plannedOg, plannedVolumeL: Number(b.plannedKnockoutL), actualOg: og, actualVolumeL: volumeL })
          : null,
      apparentAttenuation: og !== null && fg !== null && fg < og ? apparentAttenuation(og, fg) : null,
      daysBrewToPackage: packagedAt ? Math.floor((packagedAt.getTime() - Date.parse(`${b.brewDate}T00:00:00Z`)) / 86_400_000) : null,
    };
  });
  return { recipeId: recipe.id, recipeName: recipe.name, rows };
}

/** The monthly report as CSV: one line per beer and a total, in litres, US barrels and hectolitres; then packages. */
export function productionCsv(report: ProductionReport, convert: { bbl: (l: number) => number; hl: (l: number) => number }): string {
  const cell = (v: string | number) => {
    const s = typeof v === 'number' ? String(Math.round(v * 100) / 100) : v;
    // Quote every text cell, and neutralise leading formula characters for spreadsheets.
    return typeof v === 'number' ? s : `"${(/^[=+\-@\t\r]/.test(s) ? `'${s}` : s).replace(/"/g, '""')}"`;
  };
  const figures = ['brewedL', 'packagedL', 'dumpedL', 'inTankL'] as const;
  const head = ['Beer', ...figures.flatMap((f) => {
    const label = { brewedL: 'Brewed', packagedL: 'Packaged', dumpedL: 'Dumped', inTankL: 'In tanks at month end' }[f];
    return [`${label} (L)`, `${label} (US bbl)`, `${label} (hL)`];
  })];
  const line = (name: string, b: Omit<BeerFigures, 'beerName'>) => [cell(name), ...figures.flatMap((f) => [cell(b[f]), cell(convert.bbl(b[f])), cell(convert.hl(b[f]))])].join(',');
  const lines = [
    cell(`Kettlewright monthly production ${report.month} (${report.timeZone}). Official forms differ by country: these figures help prepare them.`),
    head.map(cell).join(','),
    ...report.beers.map((b) => line(b.beerName, b)),
    line('Total', report.totals),
    '',
    ['Beer', 'Package', 'Size', 'Count', 'Volume (L)', 'Volume (US bbl)', 'Volume (hL)'].map(cell).join(','),
    ...report.packages.map((p) => [cell(p.beerName), cell(p.kind), cell(p.size), cell(p.count), cell(p.volumeL), cell(convert.bbl(p.volumeL)), cell(convert.hl(p.volumeL))].join(',')),
  ];
  return `${lines.join('\r\n')}\r\n`;
}
