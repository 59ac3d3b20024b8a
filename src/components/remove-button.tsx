import { useState } from 'react';
import { Button } from './ui';

/** Removing takes two taps: the first asks, the second removes. `onRefused` gets the server's refusal to show. */
export function RemoveButton({ name, remove, onRemoved, onRefused }: { name: string; remove: () => Promise<unknown>; onRemoved?: () => void; onRefused: (error: unknown) => void }) {
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  if (!asking) {
    return (
      <Button variant="quiet" onClick={() => setAsking(true)}>
        Remove…
      </Button>
    );
  }
  return (
    <Button
      variant="danger"
      busy={busy}
      onClick={async () => {
        setBusy(true);
        try {
          await remove();
          onRemoved?.();
        } catch (error) {
          onRefused(error);
          setAsking(false);
        } finally {
          setBusy(false);
        }
      }}
    >
      Remove {name}
    </Button>
  );
}
