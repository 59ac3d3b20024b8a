import { useState } from 'react';
import { Button } from './ui';

interface Props {
  /** The first tap's label, which only asks: "Remove…", "Block access…". */
  ask: string;
  /** The second tap's label, which acts: "Remove Crystal 60", "Block Ilya Brandt". */
  confirm: string;
  act: () => Promise<unknown>;
  onDone?: () => void;
  /** Gets the server's refusal to show. */
  onRefused: (error: unknown) => void;
}

/** An action that is hard to undo or easy to mis-tap on a tablet: the first tap asks, the second acts, Cancel steps back. */
export function ConfirmButton({ ask, confirm, act, onDone, onRefused }: Props) {
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  if (!asking) {
    return (
      <Button variant="quiet" onClick={() => setAsking(true)}>
        {ask}
      </Button>
    );
  }
  return (
    <span className="inline-flex flex-wrap gap-2">
      <Button
        variant="danger"
        busy={busy}
        onClick={async () => {
          setBusy(true);
          try {
            await act();
            onDone?.();
          } catch (error) {
            onRefused(error);
          } finally {
            setBusy(false);
            setAsking(false);
          }
        }}
      >
        {confirm}
      </Button>
      <Button variant="quiet" disabled={busy} onClick={() => setAsking(false)}>
        Cancel
      </Button>
    </span>
  );
}
