import { z } from 'zod';
import { quantityField } from '../quantities/field';
import type { AbvMethod } from '../brewing';
import type { TastingSummary } from './tasting';

/** Glassware the release sheet offers. */
export const GLASSES = {
  shaker_pint: 'Shaker pint',
  nonic_pint: 'Nonic pint',
  tulip: 'Tulip',
  snifter: 'Snifter',
  stange: 'Stange',
  weizen: 'Weizen vase',
  goblet: 'Goblet',
  mug: 'Mug',
  teku: 'Stemmed taster',
} as const;
export type Glass = keyof typeof GLASSES;
const GLASS_IDS = Object.keys(GLASSES) as [Glass, ...Glass[]];

/** Allergens guests ask about (the brewery checks its own labelling law; this list is a reminder, not advice). */
export const ALLERGENS = {
  gluten: 'Gluten (barley)',
  wheat: 'Wheat',
  oats: 'Oats',
  rye: 'Rye',
  lactose: 'Lactose (milk)',
  tree_nuts: 'Tree nuts',
  peanuts: 'Peanuts',
  soy: 'Soy',
  sulphites: 'Sulphites',
  fish: 'Fish (isinglass finings)',
  shellfish: 'Shellfish',
  eggs: 'Eggs',
} as const;
export type Allergen = keyof typeof ALLERGENS;
const ALLERGEN_IDS = Object.keys(ALLERGENS) as [Allergen, ...Allergen[]];

/** Strength bands for the taproom filter, ABV % (common practice, no source). */
export const STRENGTHS = {
  session: { label: 'Session (under 4.5 %)', min: 0, max: 4.5 },
  standard: { label: 'Standard (4.5–6.5 %)', min: 4.5, max: 6.5 },
  strong: { label: 'Strong (6.5 % and up)', min: 6.5, max: 100 },
} as const;
export type Strength = keyof typeof STRENGTHS;

/** ABV as every taproom screen shows it: one decimal. */
export const shownAbvPct = (abvPct: number): number => Number(abvPct.toFixed(1));

/**
 * The strength band a beer is filed under, judged on the ABV it shows, so a beer shown as "4.5 %"
 * is never filed under "under 4.5 %" because its unrounded figure is 4.4999.
 */
export function strengthOf(abvPct: number): Strength {
  const shown = shownAbvPct(abvPct);
  // The bands are listed weakest first and meet edge to edge.
  return (Object.keys(STRENGTHS) as Strength[]).find((id) => shown < STRENGTHS[id].max) ?? 'strong';
}

/** The release sheet the head brewer writes: what guests read, and how the beer is served. */
export const releaseSheetSchema = z.strictObject({
  beerName: z.string().trim().min(1, 'Name the beer').max(120, 'Use at most 120 characters'),
  style: z.string().trim().min(1, 'Name the style').max(80, 'Use at most 80 characters'),
  description: z
    .string()
    .trim()
    .min(20, 'Write at least a sentence or two for guests (20 characters)')
    .max(2000, 'Use at most 2000 characters'),
  glass: z.enum(GLASS_IDS, { error: 'Choose a glass' }),
  servingTempC: quantityField('temperature', { label: 'Serving temperature', min: 0, max: 20 }),
  servingNotes: z.string().trim().max(500, 'Use at most 500 characters').default(''),
  allergens: z
    .array(z.enum(ALLERGEN_IDS, { error: 'Choose allergens from the list' }))
    .refine((list) => new Set(list).size === list.length, 'Each allergen once')
    .default([]),
  /** A photo attached to the batch, shown to the taproom once the beer is announced. */
  photoAttachmentId: z.number().int().positive().nullable().default(null),
  /** Show the beer to the taproom as coming soon before it is released. */
  comingSoon: z.boolean().default(false),
});
export type ReleaseSheetInput = z.input<typeof releaseSheetSchema>;
export type ReleaseSheet = z.infer<typeof releaseSheetSchema>;

const gravity = (label: string) => quantityField('gravity', { label, min: 0.99 });

/** Releasing confirms the measured numbers the head brewer saw: if the log has changed since, the server refuses. */
export const publishReleaseSchema = z.strictObject({
  confirmedOg: gravity('OG'),
  confirmedFg: gravity('FG'),
});
export type PublishReleaseInput = z.infer<typeof publishReleaseSchema>;

export const taproomListQuery = z.strictObject({
  q: z.string().trim().max(80, 'Use at most 80 characters').optional(),
  style: z.string().trim().max(80).optional(),
  strength: z.enum(Object.keys(STRENGTHS) as [Strength, ...Strength[]], { error: 'Choose a strength' }).optional(),
});
export type TaproomListQuery = z.infer<typeof taproomListQuery>;

export const idParam = z.coerce.number({ error: 'Must be a number' }).int().positive().max(2147483647);

/**
 * Where a release stands: a draft sheet, announced as coming soon, on tap, or off tap (poured out: gone from
 * the tap list and the bar screen, its sheet and numbers kept for the record).
 */
export const RELEASE_STATES = ['draft', 'coming_soon', 'on_tap', 'off_tap'] as const;
export type ReleaseState = (typeof RELEASE_STATES)[number];
/** Released to the taproom at some point: on tap now, or off tap since (its numbers were frozen at release). */
export const wasReleased = (state: ReleaseState | null | undefined): state is 'on_tap' | 'off_tap' =>
  state === 'on_tap' || state === 'off_tap';

/** Final numbers: measured where the log has them, planned otherwise (and said so). */
export interface FinalNumbers {
  og: number | null;
  fg: number | null;
  /** From measured OG and FG only. */
  abvPct: number | null;
  abvMethod: AbvMethod;
  plannedAbvPct: number;
  ibu: number;
  srm: number;
}

export interface PackageSize {
  label: string;
  count: number;
}

/** One beer as the taproom sees it: public-facing facts only, nothing from the brewing records. */
export interface TaproomBeer {
  id: number;
  state: Exclude<ReleaseState, 'draft'>;
  batchNumber: string;
  beerName: string;
  style: string;
  description: string;
  /** Measured ABV once released; the planned figure while coming soon. */
  abvPct: number;
  abvIsPlanned: boolean;
  ibu: number;
  srm: number;
  glass: Glass;
  servingTempC: number;
  servingNotes: string;
  allergens: Allergen[];
  packageSizes: PackageSize[];
  tasting: TastingSummary;
  photo: { id: number; thumbnailUrl: string; url: string } | null;
  releasedAt: string | null;
  /** When it was taken off tap (the taproom's list no longer shows it; its sheet still opens). */
  offTapAt: string | null;
}

/** The head brewer's view of one batch's release. */
export interface ReleaseDetail {
  batch: { id: number; number: string; beerName: string; status: string; style: string };
  state: ReleaseState | null;
  sheet: ReleaseSheet | null;
  numbers: FinalNumbers;
  packageSizes: PackageSize[];
  releasedAt: string | null;
  releasedBy: string | null;
  offTapAt: string | null;
  offTapBy: string | null;
}

/** The largest file a person may attach (photos and lab sheets). */
export const UPLOAD_MAX_BYTES = 15 * 1024 * 1024;
/** What may be attached, as the file picker offers it; the server checks the bytes, not this list. */
export const UPLOAD_ACCEPT = 'application/pdf,image/jpeg,image/png,image/webp';

/** A photo or lab sheet attached to a batch. */
export interface AttachmentView {
  id: number;
  kind: 'photo' | 'document';
  contentType: string;
  byteSize: number;
  displayName: string;
  tastingNoteId: number | null;
  uploadedBy: string;
  createdAt: string;
  url: string;
  thumbnailUrl: string | null;
}
