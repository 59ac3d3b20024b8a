import { useParams, useSearchParams } from 'react-router-dom';
import { Card, ErrorState, LinkButton, Loading, PageHeader, Table, Td, Th, cx } from '../../../components/ui';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { useCurrentUser } from '../../../lib/current-user';
import { show, showGrain, showSmallWeight, showVolume } from '../../../lib/units';
import { useComparison } from '../api/compare-versions';
import type { Difference } from '../../../../shared/schemas/recipes';
import type { VersionDetail } from '../../../../shared/contract/recipes';

/** Plain words for the paths in a version's document. */
const SECTION_NAMES: Record<string, string> = {
  grainBill: 'Grain bill',
  hops: 'Hop',
  yeast: 'Yeast',
  mash: 'Mash',
  water: 'Water',
  adjuncts: 'Adjunct',
  spices: 'Spice',
  fermentation: 'Fermentation',
  targets: 'Targets',
  notes: 'Notes',
};

function label(path: string, side: VersionDetail): string {
  const parts = path.split('.');
  if (parts[0] === 'computed')
    return `Computed ${parts[1] === 'abvPct' ? 'ABV' : parts[1] === 'buGu' ? 'BU:GU' : parts[1] === 'strikeTempC' ? 'strike temperature' : parts[1]!.toUpperCase()}`;
  if (parts[0] !== 'content') return parts[0] === 'changeNote' ? 'Change note' : 'Equipment';
  const [, section, ...rest] = parts;
  const words = rest
    .filter((p) => p !== 'items')
    .map((p) =>
      /^\d+$/.test(p)
        ? `#${Number(p) + 1}`
        : p
            .replace(/(Kg|Pct|[GCL])$/, '')
            .replace(/([A-Z])/g, ' $1')
            .toLowerCase(),
    );
  // Name the line (e.g. the hop's variety) so "hops #1 weight g" reads as "Hop #1 (Earthy…) weight g".
  const content = side.version.content as unknown as Record<string, unknown>;
  const nested = section === 'grainBill' && rest[0] === 'items';
  const list = nested ? side.version.content.grainBill.items : content[section!];
  const at = nested ? rest[1] : rest[0];
  const index = /^\d+$/.test(at ?? '') ? Number(at) : -1;
  const item = Array.isArray(list) && index >= 0 ? (list[index] as { name?: string } | undefined)?.name : undefined;
  return `${SECTION_NAMES[section!] ?? section} ${words.join(' ')}${item ? ` (${item})` : ''}`;
}

/** A changed value in the brewery's units where the path names one (weightKg, weightG, …TempC, …VolumeL). */
function fmt(path: string, v: Difference['a'], system: UnitSystem): string {
  if (v === null) return '—';
  if (typeof v !== 'number') return String(v);
  if (path.endsWith('TempC')) return show(system, 'temperature', v);
  if (path.startsWith('computed.')) return String(v);
  if (path.endsWith('weightKg')) return showGrain(system, v);
  if (path.endsWith('weightG')) return showSmallWeight(system, v);
  if (path.endsWith('VolumeL')) return showVolume(system, v);
  if (path.endsWith('grams')) return `${v.toFixed(1)} g`;
  return String(Number(v.toFixed(4)));
}

/** Two versions side by side: the changed values highlighted, then both summaries. */
export function ComparePage() {
  const recipeId = Number(useParams().recipeId);
  const [search] = useSearchParams();
  const a = Number(search.get('a'));
  const b = Number(search.get('b'));
  const comparison = useComparison(recipeId, a, b);
  const system = useCurrentUser().brewery.unitSystem;
  if (comparison.isPending) return <Loading label="Comparing" />;
  if (comparison.isError) return <ErrorState error={comparison.error} onRetry={() => comparison.refetch()} />;
  const { recipe, a: left, b: right, differences } = comparison.data;
  const figures = (v: VersionDetail) => [
    ['OG', v.computed.og.toFixed(3)],
    ['FG', v.computed.fg.toFixed(3)],
    ['ABV', `${v.computed.abvPct.toFixed(1)} %`],
    ['IBU', v.computed.ibu.toFixed(1)],
    ['SRM', v.computed.srm.toFixed(1)],
  ];
  return (
    <>
      <PageHeader
        title={`${recipe.name}: version ${left.version.number} and ${right.version.number}`}
        subtitle={`${differences.length} difference${differences.length === 1 ? '' : 's'}`}
        actions={
          <LinkButton variant="quiet" className="underline" to={`/recipes/${recipeId}`}>
            All versions
          </LinkButton>
        }
      />
      <div className="mb-4 grid gap-4 md:grid-cols-2">
        {[left, right].map((v) => (
          <Card key={v.version.id}>
            <h2 className="text-lg font-bold">Version {v.version.number}</h2>
            <p className="text-ink-500">
              {v.version.changeNote} — {v.version.authorName}, {new Date(v.version.createdAt).toLocaleDateString()}
            </p>
            <dl className="mt-3 grid grid-cols-5 gap-2 text-center">
              {figures(v).map(([k, x]) => (
                <div key={k} className="rounded bg-mist-100 p-2">
                  <dt className="text-xs font-semibold text-ink-500">{k}</dt>
                  <dd className="text-lg font-semibold tabular-nums">{x}</dd>
                </div>
              ))}
            </dl>
          </Card>
        ))}
      </div>
      <Table aria-label="What changed">
        <thead>
          <tr>
            <Th>What</Th>
            <Th>Version {left.version.number}</Th>
            <Th>Version {right.version.number}</Th>
          </tr>
        </thead>
        <tbody>
          {differences.map((d) => (
            <tr key={d.path}>
              <Td className="font-medium">{label(d.path, d.b === null ? left : right)}</Td>
              <Td
                className={cx(d.a === null ? 'text-ink-300' : 'bg-ember-100 text-ember-700 line-through decoration-1')}
              >
                {fmt(d.path, d.a, system)}
              </Td>
              <Td className={cx(d.b === null ? 'text-ink-300' : 'bg-cellar-100 font-semibold text-cellar-800')}>
                {fmt(d.path, d.b, system)}
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
    </>
  );
}
