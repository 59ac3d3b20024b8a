import { useState } from 'react';
import { Button } from './ui';
import { useSubmitOnce } from '../lib/use-submit-once';

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
  const { once, busy } = useSubmitOnce();
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
        onClick={once(async () => {
          try {
            await act();
            onDone?.();
          } catch (error) {
            onRefused(error);
          } finally {
            setAsking(false);
          }
        })}
      >
        {confirm}
      </Button>
      <Button variant="quiet" disabled={busy} onClick={() => setAsking(false)}>
        Cancel
      </Button>
    </span>
  );
}
