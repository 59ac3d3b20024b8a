import { useOutbox, outbox } from '../lib/outbox';
import { showTime } from '../lib/time';
import { Button, Card } from './ui';

/** What this device still has to send for a batch, and anything the server refused (with its message). */
export function OutboxPanel({ group, timeZone }: { group: string; timeZone: string }) {
  const { items, user } = useOutbox(group);
  const waiting = items.filter((i) => i.state === 'waiting');
  const rejected = items.filter((i) => i.state === 'rejected');
  if (!items.length) return null;
  return (
    <Card className="border-2 border-brass-500 p-4" aria-label="Waiting to send">
      {waiting.length > 0 && (
        <>
          <h2 className="text-lg font-bold" data-testid="waiting-count">
            {waiting.length} waiting to send
          </h2>
          <p className="text-sm text-ink-500">Kept on this tablet; sent in order when the connection returns.</p>
          <ul className="mt-2 divide-y divide-mist-200">
            {waiting.map((i) => (
              <li key={i.idempotencyKey} className="flex justify-between gap-2 py-1" data-testid="waiting-item">
                <span>
                  {i.label}
                  {i.userId !== user?.id && (
                    <span className="block text-sm text-ink-500">Sent when {i.authorName} signs in</span>
                  )}
                </span>
                <span className="tabular-nums text-ink-500">{showTime(i.capturedAt, timeZone)}</span>
              </li>
            ))}
          </ul>
        </>
      )}
      {rejected.map((i) => (
        <div key={i.idempotencyKey} role="alert" className="mt-3 rounded-lg bg-ember-100 p-3 text-ember-700">
          <p className="font-semibold">Not saved: {i.label}</p>
          <p>{i.message}</p>
          <Button variant="secondary" className="mt-2" onClick={() => void outbox().dismiss(i.idempotencyKey)}>
            I have noted it
          </Button>
        </div>
      ))}
    </Card>
  );
}
