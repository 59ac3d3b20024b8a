/** Helpers shared by this folder's tests (not part of the public API). */
import { expect } from 'vitest';
import { BrewingInputError } from './errors';

/** Asserts that `fn` throws a BrewingInputError, optionally for `field`. */
export function expectInputError(fn: () => unknown, field?: string): void {
  let caught: unknown;
  try {
    fn();
  } catch (e) {
    caught = e;
  }
  expect(caught).toBeInstanceOf(BrewingInputError);
  if (field !== undefined) expect((caught as BrewingInputError).field).toBe(field);
}
