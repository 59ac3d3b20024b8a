import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button, TextField, useToast } from '../../../components/ui';
import { dRestTriggerSg } from '../../../../shared/brewing';
import { cellarPlanSchema, type CellarPlanInput, type CellarPlanView } from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { displayUnit } from '../../../lib/units';
import { applyServerErrors } from '../../../lib/forms';
import { useSavePlan } from '../api/plan';
import { FormBanner } from '../../../components/ui/form-banner';
import { optionalNumber } from './form-values';

type PlanProps = { batchId: number; plan: CellarPlanView; unitSystem: UnitSystem };

/**
 * The batch's cellar plan: what readings and alerts are measured against. The head brewer adjusts it;
 * everyone else reads it as text, so nothing looks like a field they could change.
 */
export function PlanForm({ canEdit, ...props }: PlanProps & { canEdit: boolean }) {
  return canEdit ? <PlanEditor {...props} /> : <PlanText {...props} />;
}

function PlanText({ plan, unitSystem }: PlanProps) {
  const temp = displayUnit('temperature', unitSystem);
  const t = (c: number) => `${temp.fromSi(c).toFixed(1)} ${temp.unit}`;
  const items: [string, string][] = [
    ['Planned FG', plan.plannedFg.toFixed(3)],
    [
      'D-rest trigger',
      `${plan.dRestPoints} points above FG (starts at ${dRestTriggerSg(plan.plannedFg, plan.dRestPoints).toFixed(3)})`,
    ],
    ['Primary', t(plan.primaryTempC)],
    ['D-rest', t(plan.dRestTempC)],
    ['Crash', t(plan.crashTempC)],
    ['Target CO₂', `${plan.co2Volumes} volumes`],
    ['Reading due every', `${plan.readingIntervalHours} h`],
  ];
  return (
    <div className="space-y-3">
      <p className="rounded-lg bg-mist-100 px-3 py-2 text-sm text-ink-700" data-testid="plan-read-only">
        Read only: a head brewer changes the plan.
        {!plan.saved &&
          " It comes from the batch's recipe plan, with defaults where the recipe gives none (common practice)."}
      </p>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-3 md:grid-cols-4" aria-label="Cellar plan">
        {items.map(([term, value]) => (
          <div key={term}>
            <dt className="text-sm font-semibold text-ink-500">{term}</dt>
            <dd className="text-lg font-semibold tabular-nums">{value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}

function PlanEditor({ batchId, plan, unitSystem }: PlanProps) {
  const temp = displayUnit('temperature', unitSystem);
  const d = (c: number) => Number(temp.fromSi(c).toFixed(1));
  const save = useSavePlan(batchId);
  const toast = useToast();
  const [banner, setBanner] = useState<string>();
  const { register, handleSubmit, setError, formState, watch } = useForm<CellarPlanInput>({
    resolver: zodResolver(cellarPlanSchema),
    defaultValues: {
      plannedFg: Number(plan.plannedFg.toFixed(3)),
      tempUnit: unitSystem === 'us' ? 'f' : 'c',
      primaryTemp: d(plan.primaryTempC),
      dRestPoints: plan.dRestPoints,
      dRestTemp: d(plan.dRestTempC),
      crashTemp: d(plan.crashTempC),
      co2Volumes: plan.co2Volumes,
      readingIntervalHours: plan.readingIntervalHours,
    },
  });
  const e = formState.errors;
  const num = { setValueAs: optionalNumber } as const;
  const [fg, points] = watch(['plannedFg', 'dRestPoints']);
  const trigger =
    Number.isFinite(fg) && Number.isFinite(points) && points >= 0 && points <= 20 && fg >= 0.98 && fg <= 1.2
      ? dRestTriggerSg(fg, points)
      : null;
  const onSubmit = handleSubmit(async (values) => {
    setBanner(undefined);
    try {
      await save.mutateAsync(values);
      toast('Cellar plan saved');
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3">
      {!plan.saved && (
        <p className="text-sm text-ink-500">
          From the batch's recipe plan; defaults where the recipe gives none (common practice).
        </p>
      )}
      <FormBanner message={banner} />
      <fieldset className="grid grid-cols-2 gap-3 md:grid-cols-4">
        <TextField
          label="Planned FG"
          inputMode="decimal"
          {...register('plannedFg', num)}
          error={e.plannedFg?.message}
        />
        <TextField
          label="D-rest trigger (points above FG)"
          inputMode="decimal"
          hint={trigger ? `Starts at ${trigger.toFixed(3)}` : undefined}
          {...register('dRestPoints', num)}
          error={e.dRestPoints?.message}
        />
        <TextField
          label={`Primary (${temp.unit})`}
          inputMode="decimal"
          {...register('primaryTemp', num)}
          error={e.primaryTemp?.message}
        />
        <TextField
          label={`D-rest (${temp.unit})`}
          inputMode="decimal"
          {...register('dRestTemp', num)}
          error={e.dRestTemp?.message}
        />
        <TextField
          label={`Crash (${temp.unit})`}
          inputMode="decimal"
          {...register('crashTemp', num)}
          error={e.crashTemp?.message}
        />
        <TextField
          label="Target CO₂ (volumes)"
          inputMode="decimal"
          {...register('co2Volumes', num)}
          error={e.co2Volumes?.message}
        />
        <TextField
          label="Reading due every (hours)"
          inputMode="decimal"
          {...register('readingIntervalHours', num)}
          error={e.readingIntervalHours?.message}
        />
      </fieldset>
      <Button type="submit" busy={save.isPending}>
        Save cellar plan
      </Button>
    </form>
  );
}
