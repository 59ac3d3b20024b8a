// A double tap on Done logs one entry, and never marks the step the screen moved on to.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, renderHook } from '@testing-library/react';
import { SECOND_TAP_MS, useTapGuard } from './use-tap-guard';

afterEach(() => vi.useRealTimers());

describe('tap guard', () => {
  it('lets one of two quick taps through while the first is being kept', async () => {
    const { result } = renderHook(() => useTapGuard());
    let release!: () => void;
    const work = vi.fn(() => new Promise<boolean>((resolve) => (release = () => resolve(true))));
    let first!: Promise<boolean>;
    let second!: Promise<boolean>;
    act(() => {
      first = result.current.run('pitch-yeast', false, work);
      second = result.current.run('pitch-yeast', false, work);
    });
    await act(async () => {
      release();
      expect(await first).toBe(true);
      expect(await second).toBe(false);
    });
    expect(work).toHaveBeenCalledTimes(1);
  });

  it('ignores a second tap just after a step is logged, on the same step or the one the screen moved on to', async () => {
    vi.useFakeTimers();
    const { result } = renderHook(() => useTapGuard());
    const work = vi.fn(async () => true);
    await act(async () => expect(await result.current.run('mash-in', false, work)).toBe(true));
    vi.advanceTimersByTime(200);
    await act(async () => expect(await result.current.run('mash-in', true, work)).toBe(false)); // "Log again" double tap
    await act(async () => expect(await result.current.run('mash-rest-2', false, work)).toBe(false)); // the next step, shown by itself
    await act(async () => expect(await result.current.run('sparge-start', true, work)).toBe(true)); // picked from the list
    vi.advanceTimersByTime(SECOND_TAP_MS);
    await act(async () => expect(await result.current.run('sparge-end', false, work)).toBe(true));
    expect(work).toHaveBeenCalledTimes(3);
  });

  it('does not hold a tap back after one that logged nothing (a value to correct)', async () => {
    const { result } = renderHook(() => useTapGuard());
    await act(async () => expect(await result.current.run('strike-water', false, async () => false)).toBe(false));
    await act(async () => expect(await result.current.run('strike-water', false, async () => true)).toBe(true));
  });
});
