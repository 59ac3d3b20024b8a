import { useState } from 'react';
import { useNavigate, useParams, useSearchParams } from 'react-router-dom';
import {
  Button,
  Card,
  Dialog,
  ErrorState,
  LinkButton,
  Loading,
  PageHeader,
  SelectField,
  TextField,
  useToast,
} from '../../../components/ui';
import { useCurrentUser, useCan } from '../../../lib/current-user';
import { ApiError } from '../../../lib/api-client';
import { displayUnit, showVolume } from '../../../lib/units';
import { batchVolumeField, issueMessage } from '../../../../shared/quantities/field';
import { useEquipment } from '../../../lib/equipment';
import { useSaveScaled } from '../api/save-recipe';
import { scaleSearch, useScale } from '../api/scale-version';
import type { ScaleTarget } from '../../../../shared/schemas/recipes';
import type { ScaleResult } from '../../../../shared/contract/recipes';
import { ScaleTable } from './scale-view';

/** The scale target from the address, so a scale can be linked, reloaded and printed. */
export function useScaleTarget(): [ScaleTarget, (t: ScaleTarget) => void] {
  const [search, setSearch] = useSearchParams();
  const id = search.get('equipmentProfileId');
  const volume = search.get('batchVolumeL');
  const target: ScaleTarget = {
    ...(id ? { equipmentProfileId: Number(id) } : {}),
    ...(volume ? { batchVolumeL: Number(volume) } : {}),
  };
  return [target, (t) => setSearch(scaleSearch(t), { replace: true })];
}

function Summary({ title, data, side }: { title: string; data: ScaleResult; side: 'before' | 'after' }) {
  const me = useCurrentUser();
  const c = data.scaled[side];
  const eq = side === 'before' ? data.source.equipment : data.target.equipment;
  return (
    <Card>
      <h2 className="text-sm font-semibold uppercase tracking-wide text-ink-500">{title}</h2>
      <p className="text-xl font-bold">
        {eq.name} · {showVolume(me.brewery.unitSystem, eq.batchVolumeL)}
      </p>
      <dl className="mt-2 grid grid-cols-4 gap-2 text-center">
        {[
          ['OG', c.og.toFixed(3)],
          ['IBU', c.ibu.toFixed(1)],
          ['SRM', c.srm.toFixed(1)],
          ['ABV', `${c.abvPct.toFixed(1)} %`],
        ].map(([k, v]) => (
          <div key={k} role="group" aria-label={`${title} ${k}`} className="rounded bg-mist-100 p-2">
            <dt className="text-xs font-semibold text-ink-500">{k}</dt>
            <dd className="text-2xl font-semibold tabular-nums">{v}</dd>
          </div>
        ))}
      </dl>
    </Card>
  );
}

export function ScalePage() {
  const recipeId = Number(useParams().recipeId);
  const versionId = Number(useParams().versionId);
  const me = useCurrentUser();
  const canEdit = useCan('recipe.edit');
  const canPlan = useCan('batch.plan');
  const system = me.brewery.unitSystem;
  const navigate = useNavigate();
  const toast = useToast();
  const equipment = useEquipment();
  const [target, setTarget] = useScaleTarget();
  const scale = useScale(recipeId, versionId, target);
  const saveScaled = useSaveScaled();
  const [volumeText, setVolumeText] = useState('');
  const [volumeError, setVolumeError] = useState<string>();
  const [saving, setSaving] = useState(false);
  const [note, setNote] = useState('');
  const [saveError, setSaveError] = useState<string>();
  const vol = displayUnit('volume', system);

  if (scale.isPending || equipment.isPending) return <Loading label="Scaling" />;
  if (scale.isError) return <ErrorState error={scale.error} onRetry={() => scale.refetch()} />;
  if (equipment.isError) return <ErrorState error={equipment.error} onRetry={() => equipment.refetch()} />;
  const data = scale.data;
  const search = scaleSearch({
    equipmentProfileId: data.target.equipmentProfileId,
    batchVolumeL: data.target.equipment.batchVolumeL,
  });
  const planSearch = new URLSearchParams({
    recipeVersionId: String(versionId),
    equipmentProfileId: String(data.target.equipmentProfileId),
  });
  if (target.batchVolumeL !== undefined) planSearch.set('batchVolumeL', String(Number(target.batchVolumeL.toFixed(3))));

  const applyVolume = () => {
    const n = Number(volumeText.replace(',', '.'));
    if (!volumeText.trim() || !Number.isFinite(n) || n <= 0) return setVolumeError('Type a batch volume, e.g. 155');
    const checked = batchVolumeField().safeParse(vol.toSi(n));
    if (!checked.success) return setVolumeError(issueMessage(checked.error.issues[0]!, system));
    setVolumeError(undefined);
    setTarget({ equipmentProfileId: data.target.equipmentProfileId, batchVolumeL: checked.data });
  };

  const save = async () => {
    setSaveError(undefined);
    try {
      const saved = await saveScaled.mutateAsync({
        recipeId,
        versionId,
        input: {
          changeNote: note,
          equipmentProfileId: data.target.equipmentProfileId,
          batchVolumeL: data.target.equipment.batchVolumeL,
        },
      });
      setSaving(false);
      toast(`Saved as version ${saved.number}`);
      void navigate(`/recipes/${recipeId}/versions/${saved.id}/scale`);
    } catch (error) {
      setSaveError(error instanceof ApiError ? (error.fields.changeNote ?? error.message) : 'Not saved. Try again.');
    }
  };

  return (
    <>
      <PageHeader
        title={`Scale ${data.recipe.name} · version ${data.version.number}`}
        subtitle="Weights are re-solved for the same OG, IBU and water ppm on the new brewhouse; adjuncts and spices follow their dose per volume."
        actions={
          <>
            <LinkButton variant="quiet" className="underline" to={`/recipes/${recipeId}/versions/${versionId}`}>
              Back to the recipe
            </LinkButton>
            <LinkButton variant="secondary" to={`/recipes/${recipeId}/versions/${versionId}/brew-sheet?${search}`}>
              Brew sheet
            </LinkButton>
            {canEdit && (
              <Button variant="secondary" onClick={() => setSaving(true)}>
                Save as new version
              </Button>
            )}
            {canPlan && (
              <LinkButton variant="primary" to={`/batches/new?${planSearch.toString()}`}>
                Plan a batch
              </LinkButton>
            )}
          </>
        }
      />
      <Card className="mb-4 flex flex-wrap items-end gap-3">
        <div className="min-w-80 flex-1">
          <SelectField
            label="Scale to"
            value={data.target.equipmentProfileId}
            onChange={(e) => setTarget({ equipmentProfileId: Number(e.target.value) })}
          >
            {equipment.data.map((e) => (
              <option key={e.id} value={e.id}>
                {e.name} ({showVolume(system, e.batchVolumeL)})
              </option>
            ))}
          </SelectField>
        </div>
        <div className="w-56">
          <TextField
            label={`Or a batch volume (${vol.unit})`}
            inputMode="decimal"
            value={volumeText}
            placeholder={vol.fromSi(data.target.equipment.batchVolumeL).toFixed(0)}
            onChange={(e) => setVolumeText(e.target.value)}
            onKeyDown={(e) => e.key === 'Enter' && applyVolume()}
            hint={`Now ${showVolume(system, data.target.equipment.batchVolumeL)}`}
            error={volumeError}
          />
        </div>
        <Button variant="secondary" onClick={applyVolume}>
          Use this volume
        </Button>
        {scale.isFetching && (
          <span role="status" className="pb-3 text-ink-500">
            Recalculating…
          </span>
        )}
      </Card>
      <div className="mb-4 grid gap-4 md:grid-cols-2">
        <Summary title="Original" data={data} side="before" />
        <Summary title="Scaled" data={data} side="after" />
      </div>
      {data.scaled.warnings.length > 0 && (
        <ul aria-label="Warnings" className="mb-4 space-y-1">
          {data.scaled.warnings.map((w, i) => (
            <li
              key={i}
              className="rounded-lg border-l-4 border-ember-600 bg-ember-100 px-3 py-2 font-medium text-ember-700"
            >
              {w.message}
            </li>
          ))}
        </ul>
      )}
      <ScaleTable data={data} system={system} />
      <Dialog open={saving} onClose={() => setSaving(false)} title="Save the scaled recipe as a new version">
        <div className="space-y-3">
          <p>
            The new version is written for {data.target.equipment.name} at{' '}
            {showVolume(system, data.target.equipment.batchVolumeL)}.
          </p>
          <TextField label="What changed" value={note} onChange={(e) => setNote(e.target.value)} error={saveError} />
          <div className="flex justify-end gap-2">
            <Button variant="quiet" onClick={() => setSaving(false)}>
              Cancel
            </Button>
            <Button busy={saveScaled.isPending} onClick={save}>
              Save version
            </Button>
          </div>
        </div>
      </Dialog>
    </>
  );
}
