import { useCallback, useRef, useState, type SyntheticEvent } from 'react';

/**
 * Lets a submit run once at a time. A wet-gloved double tap lands its second tap before React has
 * re-rendered the button as busy, so `disabled` alone does not stop it: a ref, set synchronously on
 * the first tap, does. `busy` is for showing the spinner.
 */
export function useSubmitOnce() {
  const running = useRef(false);
  const [busy, setBusy] = useState(false);
  const once = useCallback(
    <A extends unknown[]>(handler: (...args: A) => Promise<unknown>) =>
      async (...args: A): Promise<void> => {
        // A blocked tap must still not fall through to the browser's own form submit.
        const event = args[0] as SyntheticEvent | undefined;
        if (event && typeof event.preventDefault === 'function') event.preventDefault();
        if (running.current) return;
        running.current = true;
        setBusy(true);
        try {
          await handler(...args);
        } finally {
          running.current = false;
          setBusy(false);
        }
      },
    [],
  );
  return { once, busy };
}
