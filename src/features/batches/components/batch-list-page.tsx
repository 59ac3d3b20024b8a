import { useState } from 'react';
import { Link } from 'react-router-dom';
import { BATCH_STATUSES, BATCH_STATUS_LABELS, type BatchStatus } from '../../../../shared/schemas/batches';
import {
  Button,
  EmptyState,
  ErrorState,
  Loading,
  PageHeader,
  SelectField,
  Table,
  Td,
  Th,
} from '../../../components/ui';
import { useBatchList } from '../api/list-batches';
import { showSg } from './format';

/** Every batch with its status, vessel, brew date and OG planned vs actual; filter by status or recipe. */
export function BatchListPage() {
  const [status, setStatus] = useState<BatchStatus | ''>('');
  const [recipeId, setRecipeId] = useState<number | ''>('');
  const [page, setPage] = useState(1);
  const list = useBatchList({ status: status || undefined, recipeId: recipeId || undefined, page });
  const recipes = new Map((list.data?.items ?? []).filter((b) => b.recipeId).map((b) => [b.recipeId!, b.beerName]));
  return (
    <div className="space-y-4">
      <PageHeader title="Batches" subtitle="Plan a batch from a recipe version's scale screen." />
      <div className="flex flex-wrap gap-4">
        <div className="w-56">
          <SelectField
            label="Status"
            value={status}
            onChange={(e) => {
              setStatus(e.target.value as BatchStatus | '');
              setPage(1);
            }}
          >
            <option value="">Any status</option>
            {BATCH_STATUSES.map((s) => (
              <option key={s} value={s}>
                {BATCH_STATUS_LABELS[s]}
              </option>
            ))}
          </SelectField>
        </div>
        <div className="w-56">
          <SelectField
            label="Recipe"
            value={recipeId}
            onChange={(e) => {
              setRecipeId(e.target.value ? Number(e.target.value) : '');
              setPage(1);
            }}
          >
            <option value="">Any recipe</option>
            {[...recipes].map(([rid, name]) => (
              <option key={rid} value={rid}>
                {name}
              </option>
            ))}
          </SelectField>
        </div>
      </div>
      {list.isPending ? (
        <Loading label="Loading batches" />
      ) : list.isError ? (
        <ErrorState error={list.error} onRetry={() => list.refetch()} />
      ) : list.data.items.length === 0 ? (
        <EmptyState title="No batches match">Change the filters, or plan a batch from a recipe.</EmptyState>
      ) : (
        <>
          <Table>
            <thead>
              <tr>
                <Th>Number</Th>
                <Th>Beer</Th>
                <Th>Status</Th>
                <Th>Vessel</Th>
                <Th>Brew date</Th>
                <Th className="text-right">OG planned</Th>
                <Th className="text-right">OG actual</Th>
              </tr>
            </thead>
            <tbody>
              {list.data.items.map((b) => (
                <tr key={b.id}>
                  <Td>
                    <Link
                      to={`/batches/${b.id}`}
                      className="flex min-h-touch items-center font-semibold text-cellar-700 underline"
                    >
                      {b.number}
                    </Link>
                  </Td>
                  <Td>{b.beerName}</Td>
                  <Td>{BATCH_STATUS_LABELS[b.status]}</Td>
                  <Td>{b.vessel?.name ?? '—'}</Td>
                  <Td className="tabular-nums">{b.brewDate}</Td>
                  <Td className="text-right tabular-nums">{showSg(b.plannedOg)}</Td>
                  <Td className="text-right tabular-nums">{b.actualOg === null ? '—' : showSg(b.actualOg)}</Td>
                </tr>
              ))}
            </tbody>
          </Table>
          {list.data.total > list.data.pageSize && (
            <div className="flex items-center gap-3">
              <Button variant="secondary" disabled={page === 1} onClick={() => setPage(page - 1)}>
                Newer
              </Button>
              <span>
                Page {page} of {Math.ceil(list.data.total / list.data.pageSize)}
              </span>
              <Button
                variant="secondary"
                disabled={page * list.data.pageSize >= list.data.total}
                onClick={() => setPage(page + 1)}
              >
                Older
              </Button>
            </div>
          )}
        </>
      )}
    </div>
  );
}
