// Values typed on the brew-day screen belong to the step they were typed for.
import { describe, expect, it } from 'vitest';
import { draftFor, EMPTY_DRAFT, type StepDraft } from './step-draft';

const typedOnMashIn: StepDraft = {
  stepKey: 'mash-in',
  typed: { tempC: '152' },
  error: 'Temperature must be at most 230 °F',
  invalid: 'tempC',
};

describe('brew-day step draft', () => {
  it('shows a step what was typed for it, with its refusal', () => {
    expect(draftFor(typedOnMashIn, 'mash-in')).toBe(typedOnMashIn);
  });

  it('shows any other step an empty form, so a strike temperature is never logged as the rest temperature', () => {
    expect(draftFor(typedOnMashIn, 'mash-rest')).toEqual({ ...EMPTY_DRAFT, stepKey: 'mash-rest' });
    expect(draftFor(typedOnMashIn, undefined)).toEqual(EMPTY_DRAFT);
  });
});
