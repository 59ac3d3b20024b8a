/**
 * Reads a logging probe's CSV export (columns: time, gravity, temperature) into
 * checked rows. Pure: no database. The import service adds the duplicates
 * already stored and writes the rows in one transaction.
 */
import Papa from 'papaparse';
import { fromZonedTime } from 'date-fns-tz';
import { BrewingInputError, fToC, MAX_SG, MIN_SG, platoToSg } from '../../shared/brewing';
import type { ProbeImportOptions, ProbeRow } from '../../shared/schemas/cellar';

/** Most rows one import accepts (a 15-minute probe over seven weeks). */
export const MAX_IMPORT_ROWS = 5000;

const LOCAL_TIME = /^(\d{4})[-/](\d{2})[-/](\d{2})[ T](\d{1,2}):(\d{2})(?::(\d{2})(?:\.\d+)?)?$/;
const ZONED_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})$/;

/** A wall-clock time in a named time zone → the instant, ms. Null when the text is not a time we read. */
export function parseProbeTime(text: string, timeZone: string): number | null {
  const value = text.trim();
  if (ZONED_TIME.test(value)) {
    const ms = Date.parse(value);
    return Number.isNaN(ms) ? null : ms;
  }
  const m = LOCAL_TIME.exec(value);
  if (!m) return null;
  const [, y = 0, mo = 0, d = 0, h = 0, mi = 0, s = 0] = m.map((part) => Number(part ?? 0));
  const wall = Date.UTC(y, mo - 1, d, h, mi, s);
  const check = new Date(wall);
  if (check.getUTCMonth() !== mo - 1 || check.getUTCDate() !== d || h > 23) return null;
  return fromZonedTime(check.toISOString().slice(0, 19), timeZone).getTime();
}

function parseNumber(text: string): number | null {
  const value = text.trim().replace(',', '.');
  if (!/^-?\d+(\.\d+)?$/.test(value)) return null;
  return Number(value);
}

export interface ParsedProbeCsv {
  rows: ProbeRow[];
}

/**
 * Parses and checks every row. A first line whose gravity is not a number is
 * taken as the header. A row with the same time as an earlier one is marked a
 * duplicate and skipped.
 */
export function parseProbeCsv(text: string, options: ProbeImportOptions): ParsedProbeCsv {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), {
    delimiter: options.delimiter,
    skipEmptyLines: 'greedy',
  });
  const lines = parsed.data;
  const rows: ProbeRow[] = [];
  const seen = new Set<number>();
  lines.forEach((cells, index) => {
    const line = index + 1;
    const [time = '', gravity = '', temp = ''] = cells;
    if (index === 0 && parseNumber(gravity) === null) return; // header
    const row: ProbeRow = { line, time, gravity, temp, status: 'ok' };
    rows.push(row);
    const fail = (message: string) => {
      row.status = 'error';
      row.error = message;
    };
    if (cells.length < 3)
      return fail(`Expected 3 columns (time, gravity, temperature), found ${cells.length}. Check the delimiter.`);
    const atMs = parseProbeTime(time, options.timeZone);
    if (atMs === null) return fail(`"${time}" is not a time. Use e.g. 2026-11-03 14:30.`);
    const g = parseNumber(gravity);
    if (g === null) return fail(`Gravity "${gravity}" is not a number.`);
    const t = parseNumber(temp);
    if (t === null) return fail(`Temperature "${temp}" is not a number.`);
    let sg = g;
    if (options.gravityUnit === 'plato') {
      try {
        sg = platoToSg(g);
      } catch (error) {
        if (error instanceof BrewingInputError) return fail(`${g} °P is outside the gravity range we read.`);
        throw error;
      }
    } else if (g < MIN_SG || g > MAX_SG) {
      return fail(`${g} is not a specific gravity (0.980–1.200). Is the unit °Plato?`);
    }
    const tempC = options.tempUnit === 'f' ? fToC(t) : t;
    if (tempC < -5 || tempC > 45)
      return fail(`${t} °${options.tempUnit.toUpperCase()} is not a fermentation temperature. Is the unit right?`);
    row.takenAt = new Date(atMs).toISOString();
    row.sg = sg;
    row.tempC = tempC;
    const second = Math.floor(atMs / 1000);
    if (seen.has(second)) row.status = 'duplicate';
    seen.add(second);
  });
  return { rows };
}
