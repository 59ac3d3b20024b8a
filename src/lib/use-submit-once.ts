import { useCallback, useRef, useState, type SyntheticEvent } from 'react';

/**
 * Lets a submit run once at a time. A wet-gloved double tap lands its second tap before React has
 * re-rendered the button as busy, so `disabled` alone does not stop it: a ref, set synchronously on
 * the first tap, does. A blocked tap answers undefined; `busy` is for showing the spinner.
 */
export function useSubmitOnce() {
  const running = useRef(false);
  const [busy, setBusy] = useState(false);
  const once = useCallback(
    <A extends unknown[], R>(handler: (...args: A) => Promise<R>) =>
      async (...args: A): Promise<R | undefined> => {
        // A blocked tap must still not fall through to the browser's own form submit.
        const event = args[0] as SyntheticEvent | undefined;
        if (event && typeof event.preventDefault === 'function') event.preventDefault();
        if (running.current) return undefined;
        running.current = true;
        setBusy(true);
        try {
          return await handler(...args);
        } finally {
          running.current = false;
          setBusy(false);
        }
      },
    [],
  );
  return { once, busy };
}
