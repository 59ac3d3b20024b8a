import { z } from 'zod';
import { KEG_SIZE_IDS, type PackagingSource } from '../brewing/packaging';
import { CARBONATION_TEMP_C } from '../brewing/carbonation';
import { timeZone } from './auth';
import { quantityField, quantityQueryField } from '../quantities/field';
import { displayUnit, type UnitSystem } from '../quantities';

/**
 * The cellar: vessels, gravity readings, logged cellar actions, packaging, the cellar plan and
 * probe imports. The API takes SI only (°C, L, kPa gauge, specific gravity); forms convert at the edge.
 * A probe file is the exception: its options say which units the file itself is written in.
 */

const note = z.string().trim().max(1000, 'Use at most 1000 characters').optional();

/** Temperatures a cellar sees: −10 °C to 45 °C. */
const CELLAR_MAX_C = 45;
const cellarTemp = (label = 'Temperature', missing?: string) =>
  quantityField('temperature', { label, max: CELLAR_MAX_C, missing });
const co2Volumes = (missing?: string) => quantityField('co2Volumes', { label: 'CO2 volumes', missing });

// ------------------------------------------------------------------- vessels

export const VESSEL_TYPES = ['fermenter', 'bright_tank'] as const;
export const VESSEL_STATUSES = ['clean', 'in_use', 'needs_cleaning'] as const;
export type VesselType = (typeof VESSEL_TYPES)[number];
export type VesselStatus = (typeof VESSEL_STATUSES)[number];

export const vesselInputSchema = z.strictObject({
  name: z.string().trim().min(1, 'Name the vessel').max(60, 'Use at most 60 characters'),
  type: z.enum(VESSEL_TYPES, { error: 'Choose fermenter or bright tank' }),
  capacityL: quantityField('volume', { label: 'Capacity', min: 0.1, max: 100_000 }),
  /** 0 for an unpressurised vessel. */
  ratedPressureKpa: quantityField('pressure', { label: 'Rated working pressure' }),
});
export type VesselInput = z.infer<typeof vesselInputSchema>;

/** A vessel as the API returns it (SI). */
export interface VesselView {
  id: number;
  name: string;
  type: VesselType;
  capacityL: number;
  ratedPressureKpa: number;
  status: VesselStatus;
  currentBatchId: number | null;
}

/** One vessel on the board: what it holds and what comes next. */
export interface BoardVessel extends VesselView {
  batch: {
    id: number;
    number: string;
    beerName: string;
    status: string;
    /** When the batch went into this vessel. */
    inSince: string;
    latestSg: number | null;
    latestTempC: number | null;
    latestAt: string | null;
    nextAction: { label: string; dueAt: string | null } | null;
    nextReadingDueAt: string | null;
    readingOverdue: boolean;
  } | null;
}

// ------------------------------------------------------------------ readings

export const READING_METHODS = ['hydrometer', 'refractometer', 'probe'] as const;
export type ReadingMethod = (typeof READING_METHODS)[number];
export const READING_METHOD_LABELS: Record<ReadingMethod, string> = {
  hydrometer: 'Hydrometer',
  refractometer: 'Refractometer',
  probe: 'Logging probe',
};
export const GRAVITY_UNITS = ['sg', 'plato', 'brix'] as const;
export type GravityUnit = (typeof GRAVITY_UNITS)[number];

/**
 * One gravity reading. A hydrometer or probe reads a specific gravity (`sg`; a form typed in °P converts it);
 * a refractometer reads °Brix (`brix`), corrected for wort and, once fermenting, for alcohol using the
 * original reading.
 */
export const readingEntrySchema = z
  .strictObject({
    kind: z.literal('reading'),
    method: z.enum(READING_METHODS, { error: 'Choose how it was measured' }),
    sg: quantityField('gravity').optional(),
    brix: quantityField('brix', { label: 'Gravity' }).optional(),
    /** Refractometer only: the reading at knockout, °Brix, for the alcohol correction. */
    originalBrix: quantityField('brix', { label: 'Original reading' }).optional(),
    wortCorrection: z
      .number({ error: 'Wort correction factor: enter a number' })
      .min(0.9, 'Wort correction factor must be at least 0.9')
      .max(1.2, 'Wort correction factor must be at most 1.2')
      .optional(),
    tempC: cellarTemp().optional(),
    ph: quantityField('ph').optional(),
    note,
  })
  .superRefine((r, ctx) => {
    const refractometer = r.method === 'refractometer';
    const [needed, other] = refractometer ? (['brix', 'sg'] as const) : (['sg', 'brix'] as const);
    if (r[needed] === undefined) ctx.addIssue({ code: 'custom', path: [needed], message: 'Gravity: enter a number' });
    if (r[other] !== undefined) {
      ctx.addIssue({
        code: 'custom',
        path: [other],
        message: 'A refractometer reads °Brix; a hydrometer or probe reads a specific gravity',
      });
    }
  });
export type ReadingEntryInput = z.infer<typeof readingEntrySchema>;

/** A reading as the API returns it: gravity stored as SG, shown in either unit. */
export interface ReadingView {
  id: number;
  /** The log entry whose values are shown: the reading's, or the latest correction's that carried values. */
  logEntryId: number;
  /** A correction replaced what was first entered (the original stays in the batch log). */
  corrected: boolean;
  takenAt: string;
  sg: number;
  plato: number;
  enteredValue: number;
  enteredUnit: GravityUnit;
  tempC: number | null;
  ph: number | null;
  method: ReadingMethod;
  authorName: string;
}

// ------------------------------------------------------------------- actions

export const CELLAR_ACTIONS = ['d_rest', 'cold_crash', 'dry_hop', 'fining', 'transfer', 'carbonation'] as const;
export type CellarAction = (typeof CELLAR_ACTIONS)[number];
export const CELLAR_ACTION_LABELS: Record<CellarAction, string> = {
  d_rest: 'D-rest started',
  cold_crash: 'Cold crash',
  dry_hop: 'Dry hop',
  fining: 'Fining',
  transfer: 'Transfer to bright tank',
  carbonation: 'Carbonation set',
};

/** What went in: hop variety and weight, fining agent and dose. */
const detail = z
  .string({ error: 'Say what went in and how much' })
  .trim()
  .min(1, 'Say what went in and how much')
  .max(200, 'Use at most 200 characters');
const setTemp = { tempC: cellarTemp('Temperature', 'Enter the set temperature') };

/**
 * The fields each cellar action takes, and only those: an entry is signed with exactly what belongs to
 * its kind, so a value typed for another kind (a dry hop's hops on a cold crash) can never ride along.
 */
const ACTION_FIELDS = {
  d_rest: { kind: z.literal('action'), action: z.literal('d_rest'), ...setTemp, note },
  cold_crash: { kind: z.literal('action'), action: z.literal('cold_crash'), ...setTemp, note },
  dry_hop: { kind: z.literal('action'), action: z.literal('dry_hop'), detail, note },
  fining: { kind: z.literal('action'), action: z.literal('fining'), detail, note },
  transfer: {
    kind: z.literal('action'),
    action: z.literal('transfer'),
    /** The volume moved and the bright tank it went to. */
    volumeL: quantityField('volume', { min: 0.1, max: 100_000, missing: 'Enter the volume moved' }),
    toVesselId: z.number({ error: 'Choose the bright tank' }).int().positive('Choose the bright tank'),
    note,
  },
  carbonation: {
    kind: z.literal('action'),
    action: z.literal('carbonation'),
    /** Target CO2 volumes at the beer's temperature, and the head pressure set, kPa gauge. */
    co2Volumes: co2Volumes('Enter the target CO2 volumes'),
    tempC: quantityField('temperature', {
      label: 'Beer temperature',
      ...CARBONATION_TEMP_C,
      missing: 'Enter the beer temperature',
    }),
    pressureKpa: quantityField('pressure', { label: 'Head pressure' }).optional(),
    note,
  },
} as const;
const chooseAction = { error: 'Choose what was done' };

/** The API's check: a field another kind takes is refused (400), never stored. */
export const actionEntrySchema = z.discriminatedUnion(
  'action',
  [
    z.strictObject(ACTION_FIELDS.d_rest),
    z.strictObject(ACTION_FIELDS.cold_crash),
    z.strictObject(ACTION_FIELDS.dry_hop),
    z.strictObject(ACTION_FIELDS.fining),
    z.strictObject(ACTION_FIELDS.transfer),
    z.strictObject(ACTION_FIELDS.carbonation),
  ],
  chooseAction,
);
/**
 * The fields of a form's draft that its chosen kind takes: what a person typed for another kind before
 * switching (the hops of a dry hop, then "Cold crash") is dropped rather than sent and refused.
 */
export function onlyActionFields<T extends { action?: unknown }>(draft: T): Partial<T> {
  const fields = ACTION_FIELDS[draft.action as CellarAction] as Record<string, unknown> | undefined;
  return fields ? (Object.fromEntries(Object.entries(draft).filter(([key]) => key in fields)) as Partial<T>) : draft;
}
export type ActionEntryInput = z.infer<typeof actionEntrySchema>;

// ----------------------------------------------------------------- packaging

export const PACKAGE_KINDS = ['keg', 'can', 'bottle'] as const;
export const KEG_SIZE_LABELS: Record<(typeof KEG_SIZE_IDS)[number], string> = {
  half_bbl: '½ bbl',
  quarter_bbl: '¼ bbl',
  sixth_bbl: '⅙ bbl',
  keg_20l: '20 L',
  keg_30l: '30 L',
  keg_50l: '50 L',
};

/** The keg sizes each brewery is offered: barrel fractions in a US brewery; those and litre kegs in a metric one. */
export const KEG_SIZES_OFFERED: Record<UnitSystem, readonly (typeof KEG_SIZE_IDS)[number][]> = {
  us: ['half_bbl', 'quarter_bbl', 'sixth_bbl'],
  metric: KEG_SIZE_IDS,
};

/** A container size in the brewery's units, without a trailing ".0": "16 fl oz", "12.7 fl oz", "473 mL". */
export function containerSize(system: UnitSystem, sizeMl: number): string {
  const unit = displayUnit('smallVolume', system);
  return `${Number(unit.fromSi(sizeMl).toFixed(unit.decimals))} ${unit.unit}`;
}

/**
 * What a person calls a package in the brewery's units: "½ bbl keg", "16 fl oz can" (US), "473 mL can" (metric).
 * `size` is a keg size id or a container size in mL.
 */
export function packageName(system: UnitSystem, kind: (typeof PACKAGE_KINDS)[number], size: string | number): string {
  if (kind === 'keg') return `${KEG_SIZE_LABELS[size as (typeof KEG_SIZE_IDS)[number]] ?? size} keg`;
  return `${containerSize(system, Number(size))} ${kind}`;
}

const count = z
  .number({ error: 'Count: enter a whole number' })
  .int('Count must be a whole number')
  .min(1, 'Count must be at least 1')
  .max(100_000);
export const packageLineSchema = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('keg'),
    size: z.enum(KEG_SIZE_IDS as [string, ...string[]], { error: 'Choose a keg size' }),
    count,
  }),
  z.strictObject({
    kind: z.enum(['can', 'bottle']),
    sizeMl: quantityField('smallVolume', { label: 'Container size' }),
    count,
  }),
]);
export type PackageLineInput = z.infer<typeof packageLineSchema>;

export const packagingEntrySchema = z.strictObject({
  kind: z.literal('packaging'),
  lines: z.array(packageLineSchema).min(1, 'Add at least one line').max(20),
  /** Last run of the batch: the batch moves to packaged. */
  final: z.boolean().optional(),
  note,
});
export type PackagingEntryInput = z.infer<typeof packagingEntrySchema>;

// ---------------------------------------------------------------------- plan

/** The batch's cellar plan, from the recipe's fermentation plan, adjusted by the head brewer. */
export const cellarPlanSchema = z.strictObject({
  plannedFg: quantityField('gravity', { label: 'Planned FG' }),
  primaryTempC: cellarTemp('Primary temperature'),
  /** D-rest starts when gravity is within this many points of planned FG. */
  dRestPoints: quantityField('gravityPoints', { label: 'D-rest trigger', max: 20 }),
  dRestTempC: cellarTemp('D-rest temperature'),
  crashTempC: cellarTemp('Crash temperature'),
  co2Volumes: co2Volumes(),
  /** A reading is overdue after this many hours without one. */
  readingIntervalHours: quantityField('hours', { label: 'Reading interval', min: 1 }),
});
export type CellarPlanInput = z.infer<typeof cellarPlanSchema>;

export interface CellarPlanView {
  /** False until the head brewer saves it: then it comes from the batch's frozen recipe plan. */
  saved: boolean;
  plannedFg: number;
  primaryTempC: number;
  dRestPoints: number;
  dRestTempC: number;
  crashTempC: number;
  co2Volumes: number;
  readingIntervalHours: number;
}

// -------------------------------------------------------------- carbonation

export const carbonationQuerySchema = z.strictObject({
  vesselId: z.coerce.number().int().positive(),
  co2Volumes: quantityQueryField('co2Volumes', { label: 'CO2 volumes' }),
  tempC: quantityQueryField('temperature', { label: 'Beer temperature', ...CARBONATION_TEMP_C }),
});
export type CarbonationQuery = z.infer<typeof carbonationQuerySchema>;

// ------------------------------------------------------------- probe import

export const PROBE_DELIMITERS = [',', ';', '\t'] as const;
export const probeImportOptionsSchema = z.strictObject({
  delimiter: z.enum(PROBE_DELIMITERS, { error: 'Choose comma, semicolon or tab' }),
  /** The units the file is written in. */
  gravityUnit: z.enum(['sg', 'plato'], { error: 'Choose SG or °P' }),
  tempUnit: z.enum(['c', 'f'], { error: 'Choose °C or °F' }),
  timeZone,
});
export type ProbeImportOptions = z.infer<typeof probeImportOptionsSchema>;

export const probeImportSchema = probeImportOptionsSchema.extend({
  csv: z.string().min(1, 'Choose a file').max(800_000, 'The file is too large (at most 800 kB)'),
});
export type ProbeImportInput = z.infer<typeof probeImportSchema>;

/** One checked row of a probe file. */
export interface ProbeRow {
  /** Line in the file, from 1. */
  line: number;
  time: string;
  gravity: string;
  temp: string;
  status: 'ok' | 'error' | 'duplicate';
  error?: string;
  takenAt?: string;
  sg?: number;
  tempC?: number;
}

export interface ProbeImportResult {
  rows: ProbeRow[];
  toImport: number;
  duplicates: number;
  errors: number;
  /** True once written (the confirm step); the preview writes nothing. */
  imported: boolean;
}

/** A logged cellar action as the API returns it (SI). */
export interface ActionView {
  logEntryId: number;
  action: CellarAction;
  at: string;
  tempC: number | null;
  volumeL: number | null;
  detail: string | null;
  co2Volumes: number | null;
  pressureKpa: number | null;
  toVesselId: number | null;
  note: string | null;
  authorName: string;
}

export interface PackagingRunView {
  logEntryId: number;
  packagedAt: string;
  lines: PackageLineInput[];
  packagedL: number;
  authorName: string;
}

/** Everything the batch's cellar page shows. */
export interface BatchCellarView {
  batch: { id: number; number: string; beerName: string; status: string; brewDate: string };
  vessel: VesselView | null;
  plan: CellarPlanView;
  og: { sg: number; measured: boolean };
  readings: ReadingView[];
  actions: ActionView[];
  packaging: PackagingSummaryView;
}

/**
 * Packaged so far against what went into the tank packaged from: the volume transferred into the bright
 * tank, or knockout when packaged from the fermenter. Until the batch is fully packaged the rest is still in
 * the tank (`notPackagedL`), not lost: `lossL` and `lossFraction` are null until then.
 */
export interface PackagingSummaryView {
  runs: PackagingRunView[];
  knockoutL: number;
  /** Where the beer is packaged from, and how much went into that tank, L. */
  source: PackagingSource;
  sourceL: number;
  packagedL: number;
  /** True once the last run is logged (or the batch has left the cellar). */
  complete: boolean;
  /** What went into the tank less packaged while the batch is still being packaged; 0 once complete. */
  notPackagedL: number;
  lossL: number | null;
  lossFraction: number | null;
  /** True once complete with a loss above shared/brewing's PLAUSIBLE_PACKAGING_LOSS for the source. */
  lossImplausible: boolean;
}

// -------------------------------------------------------------------- alerts

export const ALERT_KINDS = ['d_rest', 'stalled', 'overdue'] as const;
export type AlertKind = (typeof ALERT_KINDS)[number];

export interface AlertView {
  id: number;
  batchId: number;
  batchNumber: string;
  beerName: string;
  kind: AlertKind;
  message: string;
  createdAt: string;
  readAt: string | null;
}
