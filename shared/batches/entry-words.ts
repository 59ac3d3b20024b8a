/**
 * How the batch record words each kind of log entry, in the brewery's units: the one place that turns an
 * entry's stored SI data into what a brewer reads. Every screen that lists entries uses it.
 */
import { QUANTITIES, showQuantity, showVolume, type UnitSystem } from '../quantities';
import { packageName, CELLAR_ACTION_LABELS, READING_METHOD_LABELS } from '../schemas/cellar';
import type { CellarAction, ReadingMethod } from '../schemas/cellar';
import { lineVolumeL, type PackageLine } from '../brewing/packaging';

/** °Plato, the other scale a gravity is read in (the second gravity unit of the quantities table). */
const PLATO = QUANTITIES.gravity.units.us[1];

/** What the record shows for one entry: a headline and its values, each already in the brewery's units. */
export interface EntryWords {
  title: string;
  details: string[];
}

/** The parts of an entry its words come from. */
export interface WordedEntry {
  kind: string;
  data: Record<string, unknown>;
  reason: string | null;
}

export interface WordingContext {
  system: UnitSystem;
  /** A vessel's name by id, for the tank a transfer went into. */
  vesselName?: (id: number) => string | undefined;
}

const num = (d: Record<string, unknown>, key: string): number | undefined =>
  typeof d[key] === 'number' ? d[key] : undefined;
const text = (d: Record<string, unknown>, key: string): string | undefined =>
  typeof d[key] === 'string' && d[key] !== '' ? d[key] : undefined;

/** Temperature, volume, gravity and pH, as measured, in the brewery's units. */
export function measurementWords(
  system: UnitSystem,
  m: { tempC?: number | null; volumeL?: number | null; gravitySg?: number | null; ph?: number | null },
): string[] {
  const out: string[] = [];
  if (typeof m.tempC === 'number') out.push(showQuantity('temperature', system, m.tempC));
  if (typeof m.volumeL === 'number') out.push(showVolume(system, m.volumeL));
  if (typeof m.gravitySg === 'number') out.push(showQuantity('gravity', system, m.gravitySg));
  if (typeof m.ph === 'number') out.push(`pH ${showQuantity('ph', system, m.ph)}`);
  return out;
}

/** A package as a brewer names it in the brewery's units: "½ bbl keg", "16 fl oz can". */
export function packageWords(system: UnitSystem, line: PackageLine): string {
  return packageName(system, line.kind, line.kind === 'keg' ? line.size : line.sizeMl);
}

function actionWords(d: Record<string, unknown>, ctx: WordingContext): EntryWords {
  const action = d.action as CellarAction;
  const details: string[] = [];
  const tempC = num(d, 'tempC');
  if (tempC !== undefined) details.push(showQuantity('temperature', ctx.system, tempC));
  const detail = text(d, 'detail');
  if (detail) details.push(detail);
  const volumeL = num(d, 'volumeL');
  if (volumeL !== undefined) details.push(showVolume(ctx.system, volumeL));
  const tank = num(d, 'toVesselId');
  if (tank !== undefined) details.push(`into ${ctx.vesselName?.(tank) ?? `tank #${tank}`}`);
  const co2 = num(d, 'co2Volumes');
  if (co2 !== undefined) details.push(`${showQuantity('co2Volumes', ctx.system, co2)} CO₂`);
  const kpa = num(d, 'pressureKpa');
  if (kpa !== undefined) details.push(`head pressure ${showQuantity('pressure', ctx.system, kpa)}`);
  return { title: CELLAR_ACTION_LABELS[action] ?? 'Cellar work', details };
}

function packagingWords(d: Record<string, unknown>, system: UnitSystem): EntryWords {
  const lines = (Array.isArray(d.lines) ? d.lines : []) as PackageLine[];
  const totalL = lines.reduce((sum, line) => sum + lineVolumeL(line), 0);
  return {
    title: d.final ? 'Packaging run (last: tank emptied)' : 'Packaging run',
    details: [
      ...lines.map(
        (line) => `${line.count} × ${packageWords(system, line)} (${showVolume(system, lineVolumeL(line))})`,
      ),
      `${showVolume(system, totalL)} packaged`,
    ],
  };
}

/** The headline and values of one entry, in the brewery's units. */
export function entryWords(e: WordedEntry, ctx: WordingContext): EntryWords {
  const d = e.data;
  const measured = (d.measurements ?? {}) as Record<string, number>;
  const note = text(d, 'note');
  const withNote = (w: EntryWords): EntryWords =>
    note && e.kind !== 'note' ? { ...w, details: [...w.details, `“${note}”`] } : w;
  switch (e.kind) {
    case 'reading': {
      const method = text(d, 'method') as ReadingMethod | undefined;
      const sg = num(d, 'sg');
      return withNote({
        title: 'Gravity reading',
        details: [
          ...measurementWords(ctx.system, { gravitySg: sg, tempC: num(d, 'tempC'), ph: num(d, 'ph') }),
          ...(sg === undefined ? [] : [showQuantity('gravity', ctx.system, sg, { unit: PLATO })]),
          ...(method ? [READING_METHOD_LABELS[method] ?? method] : []),
        ],
      });
    }
    case 'action':
      return withNote(actionWords(d, ctx));
    case 'packaging':
      return withNote(packagingWords(d, ctx.system));
    case 'note':
      return { title: d.deviation ? 'Deviation' : 'Note', details: [text(d, 'text')].filter((t) => t !== undefined) };
    case 'correction':
      return { title: `Correction: ${e.reason ?? ''}`, details: measurementWords(ctx.system, measured) };
    case 'sign_off':
      return { title: 'Brew day signed off', details: [] };
    default:
      return withNote({ title: text(d, 'label') ?? 'Measurement', details: measurementWords(ctx.system, measured) });
  }
}

/** How the record lists entries: by when each was observed (the default), or in the order they arrived. */
export type RecordOrder = 'observed' | 'arrival';

/**
 * Entries in the record's order, each correction placed directly after the entry it corrects (and after
 * that entry's earlier corrections), never among unrelated entries of its own time.
 */
export function inRecordOrder<
  T extends { id: number; sequence: number; capturedAt: string; correctsEntryId: number | null },
>(entries: readonly T[], order: RecordOrder): T[] {
  const byArrival = [...entries].sort((a, b) => a.sequence - b.sequence);
  const main =
    order === 'arrival'
      ? byArrival
      : [...byArrival].sort((a, b) => Date.parse(a.capturedAt) - Date.parse(b.capturedAt) || a.sequence - b.sequence);
  const known = new Set(entries.map((e) => e.id));
  const correctionsOf = new Map<number, T[]>();
  for (const e of byArrival) {
    if (e.correctsEntryId !== null && known.has(e.correctsEntryId))
      correctionsOf.set(e.correctsEntryId, [...(correctionsOf.get(e.correctsEntryId) ?? []), e]);
  }
  const out: T[] = [];
  const place = (e: T) => {
    out.push(e);
    for (const c of correctionsOf.get(e.id) ?? []) place(c);
  };
  for (const e of main) if (e.correctsEntryId === null || !known.has(e.correctsEntryId)) place(e);
  return out;
}
