import { useEffect } from 'react';
import { Link, Navigate, useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LinkButton, Loading, cx } from '../../../components/ui';
import type { BoardVessel } from '../../../../shared/schemas/cellar';
import { VESSEL_STATUS_LABELS, VESSEL_TYPE_LABELS } from '../labels';
import { useCurrentUser } from '../../../lib/current-user';
import { show, showVolume } from '../../../lib/units';
import { useBoard } from '../api/board';
import { AlertsPanel } from './alerts-panel';

const DAY = 86_400_000;

/** "in 2 days", "in 5 h", "3 h ago". */
function relative(iso: string, now: number): string {
  const ms = Date.parse(iso) - now;
  const hours = Math.round(Math.abs(ms) / 3_600_000);
  const span = hours >= 48 ? `${Math.round(hours / 24)} days` : `${hours} h`;
  return ms >= 0 ? `in ${span}` : `${span} ago`;
}

function VesselTile({ v, now, asked }: { v: BoardVessel; now: number; asked: boolean }) {
  const me = useCurrentUser();
  const system = me.brewery.unitSystem;
  const b = v.batch;
  const body = (
    <article
      id={`vessel-${v.id}`}
      aria-label={v.name}
      aria-current={asked || undefined}
      className={cx(
        'flex h-full flex-col rounded-2xl border-4 p-5',
        asked && 'ring-4 ring-brass-400 ring-offset-2',
        b?.readingOverdue
          ? 'border-ember-600 bg-cellar-900 text-white'
          : b
            ? 'border-cellar-700 bg-cellar-900 text-white'
            : 'border-mist-300 bg-white text-ink-700',
      )}
    >
      <header className="flex items-baseline justify-between gap-2">
        <h2 className="text-3xl font-bold tracking-tight">{v.name}</h2>
        <span className={cx('text-sm font-semibold uppercase', b ? 'text-mist-200' : 'text-ink-500')}>
          {VESSEL_TYPE_LABELS[v.type]} · {showVolume(system, v.capacityL)}
        </span>
      </header>
      {b ? (
        <>
          <p className="mt-1 text-xl font-semibold text-brass-400">
            {b.beerName} <span className="text-mist-200">· {b.number}</span>
          </p>
          <p className="text-mist-200">
            Day {Math.max(1, Math.floor((now - Date.parse(b.inSince)) / DAY) + 1)} in tank · {b.status}
          </p>
          <div className="mt-3 flex items-end gap-6">
            <div>
              <div className="text-xs font-semibold uppercase text-mist-200">Gravity</div>
              <div className="text-6xl font-bold tabular-nums" data-testid="board-gravity">
                {b.latestSg === null ? '—' : b.latestSg.toFixed(3)}
              </div>
            </div>
            <div>
              <div className="text-xs font-semibold uppercase text-mist-200">Temp</div>
              <div className="text-4xl font-semibold tabular-nums">
                {b.latestTempC === null ? '—' : show(system, 'temperature', b.latestTempC, 0)}
              </div>
            </div>
          </div>
          {b.latestAt && <p className="mt-1 text-sm text-mist-200">Read {relative(b.latestAt, now)}</p>}
          <div className="mt-auto pt-3">
            {b.nextAction && (
              <p className="text-lg">
                Next: <strong>{b.nextAction.label}</strong>
                {b.nextAction.dueAt && (
                  <span className="text-mist-200">
                    {' '}
                    ·{' '}
                    {Date.parse(b.nextAction.dueAt) <= now
                      ? 'due now'
                      : `predicted ${relative(b.nextAction.dueAt, now)}`}
                  </span>
                )}
              </p>
            )}
            {b.readingOverdue ? (
              <p className="mt-2 rounded-lg bg-ember-600 px-3 py-2 text-lg font-bold text-white">Reading overdue</p>
            ) : (
              b.nextReadingDueAt && (
                <p className="text-sm text-mist-200">Next reading {relative(b.nextReadingDueAt, now)}</p>
              )
            )}
          </div>
        </>
      ) : (
        <p className="mt-3 text-2xl font-semibold">{VESSEL_STATUS_LABELS[v.status]}</p>
      )}
    </article>
  );
  return b ? (
    <Link
      to={`/cellar/batches/${b.id}`}
      className="block rounded-2xl focus:outline-none focus:ring-4 focus:ring-brass-400"
    >
      {body}
    </Link>
  ) : (
    body
  );
}

/**
 * Every vessel, readable across the room: what it holds, days in tank, latest reading, what comes next.
 * `?vessel=ID` (a tank's label) opens the batch in that vessel, or shows the vessel when it is empty.
 */
export function VesselBoardPage() {
  const { data, error, refetch, isPending, dataUpdatedAt } = useBoard();
  const asked = Number(useSearchParams()[0].get('vessel'));
  useEffect(() => {
    if (data && asked) document.getElementById(`vessel-${asked}`)?.scrollIntoView({ block: 'center' });
  }, [data, asked]);
  if (isPending) return <Loading label="Loading the vessel board" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  const holding = data.find((v) => v.id === asked)?.batch;
  if (holding) return <Navigate to={`/cellar/batches/${holding.id}`} replace />;
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h1 className="text-3xl font-bold">Vessel board</h1>
        <LinkButton to="/cellar/vessels">Manage vessels</LinkButton>
      </div>
      <AlertsPanel />
      {data.length === 0 ? (
        <EmptyState title="No vessels yet">Add your fermenters and bright tanks under Manage vessels.</EmptyState>
      ) : (
        <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
          {data.map((v) => (
            <VesselTile key={v.id} v={v} now={dataUpdatedAt} asked={v.id === asked} />
          ))}
        </div>
      )}
    </div>
  );
}
