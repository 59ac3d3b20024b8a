import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { srmToHex } from '../../../../shared/brewing';
import {
  EmptyState,
  ErrorState,
  LinkButton,
  Loading,
  PageHeader,
  SelectField,
  Table,
  Td,
  TextField,
  Th,
} from '../../../components/ui';
import { useCan } from '../../../lib/current-user';
import { useRecipeList } from '../../../lib/recipe-list';
import type { RecipeListRow } from '../../../../shared/schemas/recipes';

const col = createColumnHelper<RecipeListRow>();

/** Narrower cell padding below 1024 px, so all nine columns fit a portrait tablet (768 px) without scrolling. */
const TIGHT = '!px-2 lg:!px-4';

const STATUS_STYLE: Record<string, string> = {
  active: 'bg-cellar-100 text-cellar-800',
  draft: 'bg-sky-100 text-sky-700',
  retired: 'bg-mist-200 text-ink-500',
};

const columns = [
  col.accessor('name', {
    header: 'Name',
    cell: (c) => (
      <Link
        to={`/recipes/${c.row.original.id}`}
        className="flex min-h-touch items-center whitespace-normal font-semibold text-cellar-700 underline-offset-2 hover:underline"
      >
        {c.getValue()}
      </Link>
    ),
  }),
  col.accessor('style', { header: 'Style', cell: (c) => <span className="whitespace-normal">{c.getValue()}</span> }),
  col.accessor('latestVersion', { header: 'Version', cell: (c) => `v${c.getValue()}` }),
  col.accessor('og', { header: 'OG', cell: (c) => c.getValue().toFixed(3) }),
  col.accessor('ibu', { header: 'IBU', cell: (c) => c.getValue().toFixed(0) }),
  col.accessor('srm', {
    header: 'SRM',
    cell: (c) => (
      <span className="flex items-center gap-2">
        <span
          aria-hidden
          className="inline-block h-5 w-5 rounded-full border border-ink-300"
          style={{ backgroundColor: srmToHex(c.getValue()) }}
        />
        {c.getValue().toFixed(0)}
      </span>
    ),
  }),
  col.accessor('abvPct', { header: 'ABV', cell: (c) => `${c.getValue().toFixed(1)} %` }),
  col.accessor('status', {
    header: 'Status',
    filterFn: 'equals',
    cell: (c) => (
      <span className={`rounded-full px-2 py-1 text-sm font-semibold ${STATUS_STYLE[c.getValue()]}`}>
        {c.getValue()}
      </span>
    ),
  }),
  col.accessor('lastBrewedAt', {
    header: 'Last brewed',
    sortUndefined: 'last',
    // A calendar date: read as local midnight so it does not shift a day west of UTC.
    cell: (c) => (c.getValue() ? new Date(`${c.getValue()!}T00:00:00`).toLocaleDateString() : 'Not yet'),
  }),
];

export function RecipeListPage() {
  const canEdit = useCan('recipe.edit');
  const recipes = useRecipeList();
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }]);
  const [search, setSearch] = useState('');
  const [status, setStatus] = useState('');
  const columnFilters = useMemo(() => (status ? [{ id: 'status', value: status }] : []), [status]);
  const table = useReactTable({
    data: recipes.data ?? [],
    columns,
    state: { sorting, globalFilter: search, columnFilters },
    onSortingChange: setSorting,
    globalFilterFn: 'includesString',
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  return (
    <>
      <PageHeader
        title="Recipes"
        subtitle="Every beer, its latest version and how it was last brewed."
        actions={
          canEdit && (
            <LinkButton variant="primary" to="/recipes/new">
              New recipe
            </LinkButton>
          )
        }
      />
      {recipes.isPending ? (
        <Loading label="Loading recipes" />
      ) : recipes.isError ? (
        <ErrorState error={recipes.error} onRetry={() => recipes.refetch()} />
      ) : recipes.data.length === 0 ? (
        <EmptyState title="No recipes yet">Write the first one, then scale it to any of your brewhouses.</EmptyState>
      ) : (
        <>
          <div className="mb-4 flex flex-wrap gap-3">
            <div className="w-72">
              <TextField label="Find by name or style" value={search} onChange={(e) => setSearch(e.target.value)} />
            </div>
            <div className="w-48">
              <SelectField label="Status" value={status} onChange={(e) => setStatus(e.target.value)}>
                <option value="">All</option>
                <option value="active">Active</option>
                <option value="draft">Draft</option>
                <option value="retired">Retired</option>
              </SelectField>
            </div>
          </div>
          <Table>
            <thead>
              {table.getHeaderGroups().map((g) => (
                <tr key={g.id}>
                  {g.headers.map((h) => {
                    const sorted = h.column.getIsSorted();
                    return (
                      <Th
                        key={h.id}
                        className={TIGHT}
                        aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'}
                      >
                        <button
                          type="button"
                          className="flex min-h-touch items-center gap-1"
                          onClick={h.column.getToggleSortingHandler()}
                        >
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden>{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}</span>
                        </button>
                      </Th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {table.getRowModel().rows.map((r) => (
                <tr key={r.id}>
                  {r.getVisibleCells().map((c) => (
                    <Td key={c.id} className={`${TIGHT} whitespace-nowrap py-1`}>
                      {flexRender(c.column.columnDef.cell, c.getContext())}
                    </Td>
                  ))}
                </tr>
              ))}
            </tbody>
          </Table>
          {table.getRowModel().rows.length === 0 && <p className="mt-3 text-ink-500">No recipe matches.</p>}
        </>
      )}
    </>
  );
}
