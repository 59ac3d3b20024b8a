import { useOutbox } from '../lib/outbox';
import { showTime } from '../lib/time';
import { Card } from './ui';
import { SetAsideEntry } from './set-aside-entry';

/**
 * What this device still has to send for a batch (with the last failure while it retries), and what the server
 * refused for good, set aside with its reason.
 */
export function OutboxPanel({ group, timeZone, noteUrl }: { group: string; timeZone: string; noteUrl: string }) {
  const { items, user } = useOutbox(group);
  const waiting = items.filter((i) => i.state === 'waiting');
  const setAside = items.filter((i) => i.state === 'rejected');
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
                  {i.attempts > 0 && i.message && (
                    <span className="block text-sm text-ink-500">Not sent yet: {i.message}. Trying again.</span>
                  )}
                </span>
                <span className="tabular-nums text-ink-500">{showTime(i.capturedAt, timeZone)}</span>
              </li>
            ))}
          </ul>
        </>
      )}
      {setAside.length > 0 && (
        <>
          <h2 className="mt-2 text-lg font-bold" data-testid="set-aside-count">
            {setAside.length} set aside: the server refused {setAside.length === 1 ? 'it' : 'them'}
          </h2>
          <ul>
            {setAside.map((i) => (
              <SetAsideEntry
                key={i.idempotencyKey}
                item={i}
                mine={i.userId === user?.id}
                noteUrl={noteUrl}
                timeZone={timeZone}
              />
            ))}
          </ul>
        </>
      )}
    </Card>
  );
}
