import type { MeasureKey } from '../../../../shared/batches/brew-day';
import type { Typed } from './measurement-fields';

/** What is typed on the brew-day screen, the step it was typed for, and the last refusal of it. */
export interface StepDraft {
  stepKey: string | null;
  typed: Typed;
  error: string | null;
  invalid?: MeasureKey;
}

export const EMPTY_DRAFT: StepDraft = { stepKey: null, typed: {}, error: null };

/**
 * The draft as the step on screen sees it: its own values, or an empty form. Values typed for one step never
 * show on another, nor are logged under it, however the screen moved on (a tap on the step list, or another
 * tablet logging the step being typed).
 */
export function draftFor(draft: StepDraft, stepKey: string | undefined): StepDraft {
  return stepKey !== undefined && draft.stepKey === stepKey ? draft : { ...EMPTY_DRAFT, stepKey: stepKey ?? null };
}
