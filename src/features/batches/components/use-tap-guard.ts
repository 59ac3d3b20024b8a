import { useCallback, useRef } from 'react';
import { useSubmitOnce } from '../../../lib/use-submit-once';

/**
 * How long after a step is logged a tap on Done is taken as the same press (a double tap, or a wet glove
 * bouncing) rather than a new one. Common practice for touch screens, no source.
 */
export const SECOND_TAP_MS = 1000;

/**
 * Lets one Done through at a time (useSubmitOnce). While an entry is being kept, further taps are ignored; within
 * {@link SECOND_TAP_MS} after one is kept, a tap on the same step, or on the step the screen moved on to
 * by itself, is ignored too. A step the person picked from the list is theirs to mark at once.
 */
export function useTapGuard(windowMs = SECOND_TAP_MS) {
  const { once, busy } = useSubmitOnce();
  const last = useRef<{ key: string; at: number } | null>(null);
  /** Runs `work` for the step unless the tap is a second one; `work` answers whether it logged an entry. */
  const run = useCallback(
    async (stepKey: string, picked: boolean, work: () => Promise<boolean>): Promise<boolean> => {
      const previous = last.current;
      if (previous && Date.now() - previous.at < windowMs && (previous.key === stepKey || !picked)) return false;
      const logged = (await once(work)()) ?? false;
      if (logged) last.current = { key: stepKey, at: Date.now() };
      return logged;
    },
    [once, windowMs],
  );
  return { run, pending: busy };
}
