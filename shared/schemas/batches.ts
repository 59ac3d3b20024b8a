import { z } from 'zod';
import { batchVolumeQueryField } from '../quantities/field';
import type { ComputedRecipe, EquipmentProfile, RecipeInput } from '../brewing';
import type { ChainCheck, LogEntry, Signature } from './batch-log';
import type { RecipeVersionContent } from './recipes';

export const BATCH_STATUSES = [
  'planned',
  'brewing',
  'fermenting',
  'conditioning',
  'packaged',
  'released',
  'dumped',
] as const;
export type BatchStatus = (typeof BATCH_STATUSES)[number];

export const BATCH_STATUS_LABELS: Record<BatchStatus, string> = {
  planned: 'Planned',
  brewing: 'Brewing',
  fermenting: 'Fermenting',
  conditioning: 'Conditioning',
  packaged: 'Packaged',
  released: 'Released',
  dumped: 'Dumped',
};

/** The life of a beer: each status may move only to the next one, or to dumped (with a reason) before release. */
export const STATUS_TRANSITIONS: Record<BatchStatus, readonly BatchStatus[]> = {
  planned: ['brewing', 'dumped'],
  brewing: ['fermenting', 'dumped'],
  fermenting: ['conditioning', 'dumped'],
  conditioning: ['packaged', 'dumped'],
  packaged: ['released', 'dumped'],
  released: [],
  dumped: [],
};

export const canMoveTo = (from: BatchStatus, to: BatchStatus) => STATUS_TRANSITIONS[from].includes(to);

/**
 * The page a batch's printed label opens for its stage: the brew day until knockout (which starts
 * fermenting), then the cellar page, which also holds its packaging.
 */
export function batchStagePath(batchId: number, status: BatchStatus): string {
  return status === 'planned' || status === 'brewing' ? `/batches/${batchId}` : `/cellar/batches/${batchId}`;
}

const id = z.coerce
  .number({ error: 'Must be a number' })
  .int('Must be a whole number')
  .positive('Must be positive')
  .max(2147483647);
export const batchIdParams = z.strictObject({ id });

/** Planning a batch: a recipe version on an equipment profile, or at a typed volume (or both). */
export const createBatchSchema = z.strictObject({
  recipeVersionId: id,
  equipmentProfileId: id.optional(),
  batchVolumeL: batchVolumeQueryField().optional(),
  brewDate: z.iso.date('Brew date: choose a date'),
  fermenterId: id.optional(),
});
export type CreateBatchInput = z.infer<typeof createBatchSchema>;

/** What the planning screen shows before the batch is planned. */
export const planPreviewQuery = createBatchSchema.pick({
  recipeVersionId: true,
  equipmentProfileId: true,
  batchVolumeL: true,
});
export type PlanPreviewQuery = z.infer<typeof planPreviewQuery>;
export interface PlanPreview {
  recipeName: string;
  versionNumber: number;
  equipmentName: string;
  batchVolumeL: number;
  /** What the fermenter must hold at knockout, L. */
  fermenterFillL: number;
}

export const batchListQuery = z.strictObject({
  status: z.enum(BATCH_STATUSES).optional(),
  recipeId: id.optional(),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
});
export type BatchListQuery = z.infer<typeof batchListQuery>;

export const changeStatusSchema = z
  .strictObject({
    status: z.enum(BATCH_STATUSES, { error: 'Choose a status' }),
    reason: z.string().trim().min(3, 'Say why (at least 3 characters)').max(500).optional(),
  })
  .refine((v) => v.status !== 'dumped' || Boolean(v.reason), {
    message: 'Say why the batch was dumped',
    path: ['reason'],
  });
export type ChangeStatusInput = z.infer<typeof changeStatusSchema>;

/**
 * The plan frozen into a batch when it is planned: the recipe version restated for the batch's
 * brewhouse and volume. Later recipe edits never change it.
 */
export interface FrozenPlan {
  recipeId?: number;
  recipeVersionId?: number;
  versionNumber?: number;
  recipeName: string;
  style?: string;
  equipmentName: string;
  equipment: EquipmentProfile;
  recipe: RecipeInput;
  computed: ComputedRecipe;
  /**
   * The version's content as written (yeast pitch temperature, how adjuncts go in…), kept with plans made from
   * a recipe version (server/services/recipe-plans.ts); plans frozen without a version have none. Its weights
   * are for the version's own brewhouse: amounts come from `recipe` and `computed`.
   */
  content?: RecipeVersionContent;
}

export interface BatchSummary {
  id: number;
  number: string;
  beerName: string;
  recipeId: number | null;
  status: BatchStatus;
  brewDate: string;
  vessel: { id: number; name: string } | null;
  plannedOg: number;
  actualOg: number | null;
}

export interface BatchList {
  items: BatchSummary[];
  total: number;
  page: number;
  pageSize: number;
}

/** Planned beside actual for one quantity. */
export interface PlannedActual {
  planned: number;
  actual: number | null;
}

export interface BatchActuals {
  mashTempC: PlannedActual;
  preBoilGravity: PlannedActual;
  preBoilVolumeL: PlannedActual;
  og: PlannedActual;
  knockoutVolumeL: PlannedActual;
  /** Brewhouse efficiency (fraction) achieved, from actual OG and knockout volume. */
  brewhouseEfficiency: PlannedActual;
}

export interface BatchDetail extends BatchSummary {
  dumpedReason: string | null;
  /** ISO time the batch was dumped. */
  dumpedAt: string | null;
  recipeVersionId: number | null;
  plan: FrozenPlan;
  entries: LogEntry[];
  signatures: Signature[];
  actuals: BatchActuals;
  /** True once the head brewer has signed the brew day off: only corrections may follow. */
  brewDaySigned: boolean;
}

export type { ChainCheck };
