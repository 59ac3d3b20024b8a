/**
 * zod fields built from the quantities table. A value outside its limits is refused with a custom issue whose
 * `params` carry the quantity and the bound in SI (a `LimitRefusal`), so the server and every form word the
 * limit in the person's own units; the issue's own message is the metric wording, for a reader with no system.
 */
import { z } from 'zod';
import {
  QUANTITIES,
  limitMessage,
  limitRefusalOf,
  type Bound,
  type LimitRefusal,
  type QuantityId,
  type UnitSystem,
} from './index';

interface FieldOptions {
  /** What the form calls the field ("Rest temperature"); default the quantity's name. */
  label?: string;
  /** Narrower SI limits for this field; never wider than the quantity's. */
  min?: number;
  max?: number;
}

/** The check a quantity field runs: the value within the quantity's limits or the field's narrower ones. */
function withinLimits(id: QuantityId, opts: FieldOptions) {
  const spec = QUANTITIES[id];
  const label = opts.label ?? spec.name;
  const min = opts.min ?? spec.min;
  const max = opts.max ?? spec.max;
  if (min < spec.min || max > spec.max || min > max) {
    throw new Error(`${label}: limits ${min}–${max} are outside ${id}'s ${spec.min}–${spec.max}`);
  }
  const check = (value: number, ctx: z.RefinementCtx) => {
    const bound: Bound | null = value < min ? 'min' : value > max ? 'max' : null;
    if (!bound) return;
    const refusal: LimitRefusal = { quantity: id, bound, si: bound === 'min' ? min : max, label };
    ctx.addIssue({ code: 'custom', message: limitMessage(refusal, 'metric'), params: refusal, input: value });
  };
  return { label, check };
}

/** A number of `id` in SI, within the quantity's limits or the field's narrower ones. */
export function quantityField(id: QuantityId, opts: FieldOptions = {}) {
  const { label, check } = withinLimits(id, opts);
  return z.number({ error: `${label}: enter a number` }).superRefine(check);
}

/** The same field read from a query string ("12.5" becomes 12.5). */
export function quantityQueryField(id: QuantityId, opts: FieldOptions = {}) {
  const { label, check } = withinLimits(id, opts);
  return z.coerce.number({ error: `${label}: enter a number` }).superRefine(check);
}

/** The limit a zod issue refuses, when it is one of a quantity field's. */
export function issueRefusal(issue: z.core.$ZodIssue): LimitRefusal | null {
  return issue.code === 'custom' ? limitRefusalOf(issue.params) : null;
}

/** An issue's message for a person in `system`: a limit in their units, anything else as written. */
export function issueMessage(issue: z.core.$ZodIssue, system: UnitSystem): string {
  const refusal = issueRefusal(issue);
  return refusal ? limitMessage(refusal, system) : issue.message;
}

/** A batch's volume into the fermenter, from a pilot batch to a large brewpub's: 1 L to 20 000 L. */
const BATCH_VOLUME = { min: 1, max: 20_000 } as const;
export const batchVolumeField = (label = 'Batch volume') => quantityField('volume', { label, ...BATCH_VOLUME });
/** The batch volume read from a query string. */
export const batchVolumeQueryField = () => quantityQueryField('volume', { label: 'Batch volume', ...BATCH_VOLUME });
