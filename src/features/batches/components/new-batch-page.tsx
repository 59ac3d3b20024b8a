import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { zodResolver } from '@hookform/resolvers/zod';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { createBatchSchema, type CreateBatchInput } from '../../../../shared/schemas/batches';
import { Button, Card, PageHeader, SelectField, TextField } from '../../../components/ui';
import { applyServerErrors } from '../../../lib/forms';
import { useCurrentUser } from '../../../lib/current-user';
import { showVolume } from '../../../lib/units';
import { usePlanBatch } from '../api/plan-batch';
import { usePlanPreview } from '../api/plan-preview';
import { todayIn } from './format';
import { tooSmall } from '../../../../shared/batches/fermenter';
import type { PlanPreview } from '../../../../shared/schemas/batches';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { useFreeFermenters } from '../api/free-fermenters';
import { FormBanner } from '../../../components/ui/form-banner';

/**
 * Plans a batch: `/batches/new?recipeVersionId=&equipmentProfileId=` or `&batchVolumeL=` (from the recipe's
 * scale screen). The scaled plan is frozen into the batch and the version is frozen too.
 */
export function NewBatchPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useCurrentUser();
  const plan = usePlanBatch();
  const fermenters = useFreeFermenters();
  const [banner, setBanner] = useState<string | null>(null);
  const num = (k: string) => (params.get(k) ? Number(params.get(k)) : undefined);
  const form = useForm<z.input<typeof createBatchSchema>, unknown, CreateBatchInput>({
    resolver: zodResolver(createBatchSchema),
    defaultValues: {
      recipeVersionId: num('recipeVersionId'),
      equipmentProfileId: num('equipmentProfileId'),
      batchVolumeL: num('batchVolumeL'),
      brewDate: todayIn(me.brewery.timeZone),
    },
  });
  const system = me.brewery.unitSystem;
  const preview = usePlanPreview({
    recipeVersionId: num('recipeVersionId'),
    equipmentProfileId: num('equipmentProfileId'),
    batchVolumeL: num('batchVolumeL'),
  });
  const fill = preview.data?.fermenterFillL;
  return (
    <div className="max-w-xl space-y-4">
      <PageHeader
        title="Plan a batch"
        subtitle={planned(system, preview.data, preview.isPending && params.has('recipeVersionId'))}
      />
      <Card className="p-5">
        <form
          className="space-y-4"
          onSubmit={form.handleSubmit((input) =>
            plan.mutate(input, {
              onSuccess: (batch) => void navigate(`/batches/${batch.id}`),
              onError: (error) => setBanner(applyServerErrors(error, form.setError)),
            }),
          )}
        >
          {!params.get('recipeVersionId') && (
            <p className="text-ember-700">Open a recipe version and choose “Plan a batch” from its scale screen.</p>
          )}
          <TextField
            label="Brew date"
            type="date"
            {...form.register('brewDate')}
            error={form.formState.errors.brewDate?.message}
          />
          <SelectField
            label="Fermenter"
            hint="Empty fermenters, largest first, with their size; one marked “needs cleaning” must be cleaned before knockout. You can assign one later."
            {...form.register('fermenterId', { setValueAs: (v: string) => (v ? Number(v) : undefined) })}
            error={form.formState.errors.fermenterId?.message}
          >
            <option value="">Choose later</option>
            {(fermenters.data ?? []).map((v) => {
              const small = fill !== undefined && tooSmall(v.capacityL, fill);
              return (
                <option key={v.id} value={v.id} disabled={small}>
                  {v.name} · {showVolume(system, v.capacityL)}
                  {v.status === 'needs_cleaning' ? ' · needs cleaning' : ''}
                  {small ? ' · too small for this batch' : ''}
                </option>
              );
            })}
          </SelectField>
          {Object.entries(form.formState.errors)
            .filter(([k]) => k !== 'brewDate' && k !== 'fermenterId')
            .map(([k, e]) => (
              <p key={k} className="text-ember-700">
                {e?.message as string}
              </p>
            ))}
          <FormBanner message={banner} />
          <Button type="submit" size="lg" busy={plan.isPending}>
            Plan the batch
          </Button>
        </form>
      </Card>
    </div>
  );
}

/** What is being planned, in words: "Breakwater Pale v3 on Main brewhouse, 10.0 bbl". */
function planned(system: UnitSystem, preview: PlanPreview | undefined, loading: boolean): string {
  if (preview)
    return `${preview.recipeName} v${preview.versionNumber} on ${preview.equipmentName}, ${showVolume(system, preview.batchVolumeL)}`;
  return loading ? 'Reading the recipe version…' : 'Choose a recipe version first';
}
