import { useState } from 'react';
import {
  Bar,
  BarChart,
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { EmptyState, ErrorState, Loading, PageHeader, SelectField, Table, Td, Th } from '../../../components/ui';
import { useRecipeList } from '../../../lib/recipe-list';
import { useBatchHistory } from '../api/history';
import { niceAxis } from '../../../lib/chart-ticks';

const sg = (v: number | null) => (v === null ? '–' : v.toFixed(3));
const pct = (v: number | null) => (v === null ? '–' : `${(v * 100).toFixed(1)} %`);

/** A recipe's batches side by side: planned vs actual OG, efficiency, attenuation, days from brew to package. */
export function HistoryPage() {
  const recipes = useRecipeList();
  const [recipeId, setRecipeId] = useState<number | null>(null);
  const history = useBatchHistory(recipeId);
  // Oldest first for the chart, so time runs left to right.
  const points = [...(history.data?.rows ?? [])].reverse().map((r) => ({
    number: r.number,
    plannedOg: r.plannedOg,
    actualOg: r.actualOg,
    efficiency: r.actualEfficiency === null ? null : r.actualEfficiency * 100,
    attenuation: r.apparentAttenuation === null ? null : r.apparentAttenuation * 100,
    days: r.daysBrewToPackage,
  }));
  const ogAxis = niceAxis(
    points.flatMap((p) => [p.plannedOg, p.actualOg]),
    { pad: 0.002, target: 4 },
  );
  const percentAxis = niceAxis(
    points.flatMap((p) => [p.efficiency, p.attenuation]),
    { pad: 1, target: 4 },
  );
  return (
    <div className="space-y-5">
      <PageHeader title="Batch history" subtitle="Is the beer staying the same? Compare every batch of a recipe." />
      <div className="w-72">
        <SelectField
          label="Recipe"
          value={recipeId ?? ''}
          onChange={(e) => setRecipeId(e.target.value ? Number(e.target.value) : null)}
        >
          <option value="">Choose a recipe</option>
          {(recipes.data ?? []).map((r) => (
            <option key={r.id} value={r.id}>
              {r.name}
            </option>
          ))}
        </SelectField>
      </div>
      {recipeId === null ? (
        <EmptyState title="Choose a recipe">Its batches appear here, newest first.</EmptyState>
      ) : history.isPending ? (
        <Loading label="Loading the batches" />
      ) : history.isError ? (
        <ErrorState error={history.error} onRetry={() => history.refetch()} />
      ) : history.data.rows.length === 0 ? (
        <EmptyState title="No batches of this recipe yet">Plan one from the recipe's scale screen.</EmptyState>
      ) : (
        <>
          <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
            <figure className="h-72 rounded-xl border border-mist-200 bg-white p-3">
              <figcaption className="px-2 text-sm font-semibold text-ink-700">OG, planned and measured</figcaption>
              <ResponsiveContainer width="100%" height="90%">
                <LineChart data={points}>
                  <CartesianGrid stroke="#e5e7eb" />
                  <XAxis dataKey="number" tick={{ fontSize: 12 }} />
                  <YAxis
                    type="number"
                    domain={ogAxis.domain}
                    ticks={ogAxis.ticks}
                    interval={0}
                    tickFormatter={(v: number) => v.toFixed(3)}
                    width={56}
                  />
                  <Tooltip formatter={(v) => (typeof v === 'number' ? v.toFixed(3) : String(v))} />
                  <Legend />
                  <Line
                    type="stepAfter"
                    dataKey="plannedOg"
                    name="Planned OG"
                    stroke="#64748b"
                    strokeWidth={2}
                    strokeDasharray="6 4"
                    isAnimationActive={false}
                  />
                  <Line
                    type="linear"
                    dataKey="actualOg"
                    name="Measured OG"
                    stroke="#2f6b4f"
                    strokeWidth={3}
                    connectNulls
                    isAnimationActive={false}
                  />
                </LineChart>
              </ResponsiveContainer>
            </figure>
            <figure className="h-72 rounded-xl border border-mist-200 bg-white p-3">
              <figcaption className="px-2 text-sm font-semibold text-ink-700">
                Brewhouse efficiency and apparent attenuation (%)
              </figcaption>
              <ResponsiveContainer width="100%" height="90%">
                <LineChart data={points}>
                  <CartesianGrid stroke="#e5e7eb" />
                  <XAxis dataKey="number" tick={{ fontSize: 12 }} />
                  <YAxis
                    type="number"
                    domain={percentAxis.domain}
                    ticks={percentAxis.ticks}
                    interval={0}
                    tickFormatter={(v: number) => v.toFixed(percentAxis.decimals)}
                    width={40}
                  />
                  <Tooltip formatter={(v) => (typeof v === 'number' ? `${v.toFixed(1)} %` : String(v))} />
                  <Legend />
                  <Line
                    dataKey="efficiency"
                    name="Efficiency"
                    stroke="#b7791f"
                    strokeWidth={3}
                    connectNulls
                    isAnimationActive={false}
                  />
                  <Line
                    dataKey="attenuation"
                    name="Attenuation"
                    stroke="#2563eb"
                    strokeWidth={3}
                    connectNulls
                    isAnimationActive={false}
                  />
                </LineChart>
              </ResponsiveContainer>
            </figure>
            <figure className="h-72 rounded-xl border border-mist-200 bg-white p-3">
              <figcaption className="px-2 text-sm font-semibold text-ink-700">Days from brew to package</figcaption>
              <ResponsiveContainer width="100%" height="90%">
                <BarChart data={points}>
                  <CartesianGrid stroke="#e5e7eb" />
                  <XAxis dataKey="number" tick={{ fontSize: 12 }} />
                  <YAxis allowDecimals={false} width={32} />
                  <Tooltip formatter={(v) => `${String(v)} days`} />
                  <Bar dataKey="days" name="Days" fill="#2f6b4f" isAnimationActive={false} />
                </BarChart>
              </ResponsiveContainer>
            </figure>
          </div>
          <Table>
            <thead>
              <tr>
                <Th>Batch</Th>
                <Th>Brewed</Th>
                <Th className="text-right">OG planned</Th>
                <Th className="text-right">OG measured</Th>
                <Th className="text-right">Efficiency planned</Th>
                <Th className="text-right">Efficiency achieved</Th>
                <Th className="text-right">Apparent attenuation</Th>
                <Th className="text-right">Days brew → package</Th>
              </tr>
            </thead>
            <tbody>
              {history.data.rows.map((r) => (
                <tr key={r.batchId}>
                  <Td className="font-semibold">{r.number}</Td>
                  <Td>{r.brewDate}</Td>
                  <Td className="text-right">{sg(r.plannedOg)}</Td>
                  <Td className="text-right">{sg(r.actualOg)}</Td>
                  <Td className="text-right">{pct(r.plannedEfficiency)}</Td>
                  <Td className="text-right">{pct(r.actualEfficiency)}</Td>
                  <Td className="text-right">{pct(r.apparentAttenuation)}</Td>
                  <Td className="text-right">{r.daysBrewToPackage ?? '–'}</Td>
                </tr>
              ))}
            </tbody>
          </Table>
        </>
      )}
    </div>
  );
}
