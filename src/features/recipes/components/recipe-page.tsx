import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { srmToHex } from '../../../../shared/brewing';
import { Button, Card, ErrorState, LinkButton, Loading, PageHeader, Table, Td, Th } from '../../../components/ui';
import { useCurrentUser, useCan } from '../../../lib/current-user';
import { showVolume } from '../../../lib/units';
import { useEquipment } from '../../../lib/equipment';
import { useRecipe } from '../api/get-recipe';

/** A recipe's history: every version with author, date and change note; pick two to compare. */
export function RecipePage() {
  const recipeId = Number(useParams().recipeId);
  const me = useCurrentUser();
  const canEdit = useCan('recipe.edit');
  const navigate = useNavigate();
  const recipe = useRecipe(recipeId);
  const equipment = useEquipment();
  const [picked, setPicked] = useState<number[]>([]);

  if (recipe.isPending) return <Loading label="Loading the recipe" />;
  if (recipe.isError) return <ErrorState error={recipe.error} onRetry={() => recipe.refetch()} />;
  const r = recipe.data;
  const latest = r.versions[0]!;
  const equipmentName = (id: number) => equipment.data?.find((e) => e.id === id)?.name ?? '…';
  const toggle = (id: number) => setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : [...p.slice(-1), id]));
  const [a, b] = [...picked].sort(
    (x, y) => r.versions.find((v) => v.id === x)!.number - r.versions.find((v) => v.id === y)!.number,
  );

  return (
    <>
      <PageHeader
        title={r.name}
        subtitle={`${r.style} · ${r.status} · ${r.description}`}
        actions={
          <>
            <LinkButton variant={canEdit ? 'primary' : 'secondary'} to={`/recipes/${r.id}/versions/${latest.id}`}>
              {canEdit ? `Edit version ${latest.number}` : `Open version ${latest.number}`}
            </LinkButton>
            <LinkButton variant="secondary" to={`/recipes/${r.id}/versions/${latest.id}/scale`}>
              Scale
            </LinkButton>
            <LinkButton variant="secondary" to={`/recipes/${r.id}/versions/${latest.id}/brew-sheet`}>
              Brew sheet
            </LinkButton>
          </>
        }
      />
      <Card className="space-y-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 className="text-xl font-bold">Versions</h2>
          <Button
            variant="secondary"
            disabled={!a || !b}
            onClick={() => navigate(`/recipes/${r.id}/compare?a=${a}&b=${b}`)}
          >
            Compare the two ticked
          </Button>
        </div>
        <Table>
          <thead>
            <tr>
              <Th>Compare</Th>
              <Th>Version</Th>
              <Th>Change</Th>
              <Th>By</Th>
              <Th>Saved</Th>
              <Th>Written for</Th>
              <Th>OG</Th>
              <Th>IBU</Th>
              <Th>SRM</Th>
              <Th>ABV</Th>
            </tr>
          </thead>
          <tbody>
            {r.versions.map((v) => (
              <tr key={v.id}>
                <Td>
                  <input
                    type="checkbox"
                    className="h-6 w-6"
                    aria-label={`Compare version ${v.number}`}
                    checked={picked.includes(v.id)}
                    onChange={() => toggle(v.id)}
                  />
                </Td>
                <Td>
                  <Link to={`/recipes/${r.id}/versions/${v.id}`} className="font-semibold text-cellar-700 underline">
                    v{v.number}
                  </Link>
                  {v.frozenAt && (
                    <span
                      className="ml-2 rounded-full bg-mist-200 px-2 text-xs font-semibold text-ink-700"
                      title="Used by a batch: changes make a new version"
                    >
                      brewed
                    </span>
                  )}
                </Td>
                <Td>{v.changeNote}</Td>
                <Td>{v.authorName}</Td>
                <Td>{new Date(v.createdAt).toLocaleDateString()}</Td>
                <Td>
                  {equipmentName(v.equipmentProfileId)} · {showVolume(me.brewery.unitSystem, v.batchVolumeL)}
                </Td>
                <Td>{v.og.toFixed(3)}</Td>
                <Td>{v.ibu.toFixed(0)}</Td>
                <Td>
                  <span className="flex items-center gap-2">
                    <span
                      aria-hidden
                      className="inline-block h-4 w-4 rounded-full border border-ink-300"
                      style={{ backgroundColor: srmToHex(v.srm) }}
                    />
                    {v.srm.toFixed(0)}
                  </span>
                </Td>
                <Td>{v.abvPct.toFixed(1)} %</Td>
              </tr>
            ))}
          </tbody>
        </Table>
      </Card>
    </>
  );
}
