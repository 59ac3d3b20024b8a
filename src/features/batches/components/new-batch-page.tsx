import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { zodResolver } from '@hookform/resolvers/zod';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { createBatchSchema, type CreateBatchInput } from '../../../../shared/schemas/batches';
import { Button, Card, PageHeader, SelectField, TextField } from '../../../components/ui';
import { applyServerErrors } from '../../../lib/forms';
import { useCurrentUser } from '../../../app/current-user';
import { showVolume } from '../../../lib/units';
import { usePlanBatch } from '../api/plan-batch';
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
      brewDate: new Date().toISOString().slice(0, 10),
    },
  });
  const volume = num('batchVolumeL');
  return (
    <div className="max-w-xl space-y-4">
      <PageHeader title="Plan a batch" subtitle={volume ? `At ${showVolume(me.brewery.unitSystem, volume)}` : 'On the chosen equipment profile'} />
      <Card className="p-5">
        <form
          className="space-y-4"
          onSubmit={form.handleSubmit((input) =>
            plan.mutate(input, {
              onSuccess: (batch) => navigate(`/batches/${batch.id}`),
              onError: (error) => setBanner(applyServerErrors(error, form.setError)),
            }),
          )}
        >
          {!params.get('recipeVersionId') && <p className="text-ember-700">Open a recipe version and choose “Plan a batch” from its scale screen.</p>}
          <TextField label="Brew date" type="date" {...form.register('brewDate')} error={form.formState.errors.brewDate?.message} />
          <SelectField
            label="Fermenter"
            hint="Only empty fermenters are listed; you can assign one later."
            {...form.register('fermenterId', { setValueAs: (v: string) => (v ? Number(v) : undefined) })}
            error={form.formState.errors.fermenterId?.message}
          >
            <option value="">Choose later</option>
            {(fermenters.data ?? []).map((v) => (
              <option key={v.id} value={v.id}>
                {v.name} · {showVolume(me.brewery.unitSystem, v.capacityL)}
              </option>
            ))}
          </SelectField>
          {Object.entries(form.formState.errors)
            .filter(([k]) => k !== 'brewDate' && k !== 'fermenterId')
            .map(([k, e]) => (
              <p key={k} className="text-ember-700">{e?.message as string}</p>
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
