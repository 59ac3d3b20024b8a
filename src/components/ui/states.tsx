import type { ReactNode } from 'react';
import { Button } from './button';
import { ApiError } from '../../lib/api-client';

/** Answers that the same request cannot change by being sent again: refused, missing, or wrong. */
const FINAL_STATUSES = new Set([400, 403, 404, 409, 410, 422]);

export function Loading({ label = 'Loading' }: { label?: string }) {
  return (
    <div role="status" className="flex items-center gap-3 p-8 text-ink-500">
      <span className="h-5 w-5 animate-spin rounded-full border-2 border-cellar-600 border-t-transparent" aria-hidden />
      {label}…
    </div>
  );
}

/** A failed load, with "Try again" only when trying again could help (a dropped connection, a busy server). */
export function ErrorState({ error, onRetry }: { error: unknown; onRetry?: () => void }) {
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  const final = error instanceof ApiError && FINAL_STATUSES.has(error.status);
  return (
    <div role="alert" className="rounded-xl border-2 border-ember-600 bg-ember-100 p-5 text-ember-700">
      <p className="font-semibold">This could not be loaded.</p>
      <p className="mt-1">{message}</p>
      {onRetry && !final && (
        <Button variant="secondary" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      )}
    </div>
  );
}

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-xl border-2 border-dashed border-mist-300 bg-white p-8 text-center">
      <p className="text-lg font-semibold text-ink-700">{title}</p>
      {children && <div className="mt-1 text-ink-500">{children}</div>}
      {action && <div className="mt-4">{action}</div>}
    </div>
  );
}

/** A caution box for hot liquids, pressure and chemicals. */
export function Caution({ title = 'Caution', children }: { title?: string; children: ReactNode }) {
  return (
    <aside role="note" className="rounded-lg border-l-8 border-brass-500 bg-brass-100 p-4 text-ink-900">
      <p className="font-bold">⚠ {title}</p>
      <div className="mt-1 text-sm">{children}</div>
    </aside>
  );
}
