import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui';
import { useCan } from '../../../lib/current-user';
import { useAlerts, useMarkAlertRead } from '../api/alerts';

/**
 * Unread cellar alerts for the brewers (the same ones are e-mailed): every batch's on the vessel board,
 * one batch's on its cellar page (`batchId`). Shown only to roles the access policy lets read them.
 */
export function AlertsPanel({ batchId }: { batchId?: number }) {
  const mayRead = useCan('cellar.alerts');
  const { data } = useAlerts(mayRead);
  const markRead = useMarkAlertRead();
  const unread = (data ?? []).filter((a) => a.readAt === null && (batchId === undefined || a.batchId === batchId));
  if (!unread.length) return null;
  return (
    <section aria-label="Cellar alerts" className="space-y-2">
      {unread.map((a) => (
        <div
          key={a.id}
          role="alert"
          className="flex flex-wrap items-center justify-between gap-3 rounded-xl border-l-8 border-brass-500 bg-brass-100 p-4"
        >
          <p className="text-lg">
            <Link className="font-bold underline" to={`/cellar/batches/${a.batchId}`}>
              {a.beerName} · {a.batchNumber}
            </Link>
            : {a.message}
          </p>
          <Button variant="secondary" onClick={() => markRead.mutate(a.id)}>
            Seen
          </Button>
        </div>
      ))}
    </section>
  );
}
