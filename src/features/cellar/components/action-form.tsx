import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button, SelectField, TextField } from '../../../components/ui';
import {
  actionEntrySchema,
  CELLAR_ACTION_LABELS,
  CELLAR_ACTIONS,
  type ActionEntryInput,
  type CellarPlanView,
  type VesselView,
} from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { displayUnit } from '../../../lib/units';
import { useLogCellarEntry } from '../api/log-cellar-entry';
import { useVessels } from '../api/vessels';

import { optionalNumber } from './form-values';
import { useSubmitOnce } from '../../../lib/use-submit-once';
const ACTIONS_HERE = CELLAR_ACTIONS.filter((a) => a !== 'carbonation'); // carbonation is set from its own panel

/** Logs D-rest, cold crash, dry hop, fining or a transfer as a signed entry through the outbox. */
export function ActionForm({
  batchId,
  plan,
  unitSystem,
}: {
  batchId: number;
  plan: CellarPlanView;
  unitSystem: UnitSystem;
}) {
  const log = useLogCellarEntry(batchId);
  const vessels = useVessels();
  const [saved, setSaved] = useState<string>();
  const temp = displayUnit('temperature', unitSystem);
  const planTemp = { d_rest: plan.dRestTempC, cold_crash: plan.crashTempC } as Record<string, number>;
  const { register, handleSubmit, watch, setValue, reset, formState } = useForm<ActionEntryInput>({
    resolver: zodResolver(actionEntrySchema),
    defaultValues: {
      kind: 'action',
      action: 'd_rest',
      tempUnit: unitSystem === 'us' ? 'f' : 'c',
      volumeUnit: unitSystem === 'us' ? 'bbl' : 'l',
      temp: Number(temp.fromSi(plan.dRestTempC).toFixed(1)),
    },
  });
  const action = watch('action');
  const errors = formState.errors;
  const tanks = (vessels.data ?? []).filter(
    (v: VesselView) => v.type === 'bright_tank' && (v.currentBatchId === null || v.currentBatchId === batchId),
  );

  const { once, busy } = useSubmitOnce();
  const onSubmit = once(
    handleSubmit(async (values) => {
      const label = CELLAR_ACTION_LABELS[values.action];
      await log(values, label);
      setSaved(label);
      reset({ kind: 'action', action: values.action, tempUnit: values.tempUnit, volumeUnit: values.volumeUnit });
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Log cellar work" className="space-y-3">
      <SelectField
        label="What was done"
        {...register('action', {
          onChange: (e) => {
            const t = planTemp[e.target.value as string];
            setValue('temp', t === undefined ? undefined : Number(temp.fromSi(t).toFixed(1)));
          },
        })}
      >
        {ACTIONS_HERE.map((a) => (
          <option key={a} value={a}>
            {CELLAR_ACTION_LABELS[a]}
          </option>
        ))}
      </SelectField>
      {(action === 'd_rest' || action === 'cold_crash') && (
        <TextField
          label={`Set temperature (${temp.unit})`}
          inputMode="decimal"
          className="text-2xl"
          {...register('temp', { setValueAs: optionalNumber })}
          error={errors.temp?.message}
        />
      )}
      {(action === 'dry_hop' || action === 'fining') && (
        <TextField
          label={action === 'dry_hop' ? 'Hops and weight' : 'Fining agent and dose'}
          {...register('detail')}
          error={errors.detail?.message}
        />
      )}
      {action === 'transfer' && (
        <div className="grid grid-cols-[1fr_auto] gap-3">
          <TextField
            label="Volume moved"
            inputMode="decimal"
            className="text-2xl"
            {...register('volume', { setValueAs: optionalNumber })}
            error={errors.volume?.message}
          />
          <SelectField label="Unit" {...register('volumeUnit')}>
            <option value="bbl">bbl</option>
            <option value="l">L</option>
          </SelectField>
          <div className="col-span-2">
            <SelectField
              label="Into bright tank"
              {...register('toVesselId', { setValueAs: optionalNumber })}
              error={errors.toVesselId?.message}
            >
              <option value="">Choose…</option>
              {tanks.map((v) => (
                <option key={v.id} value={v.id}>
                  {v.name}
                  {v.status === 'needs_cleaning' ? ' (needs cleaning)' : ''}
                </option>
              ))}
            </SelectField>
          </div>
        </div>
      )}
      <TextField
        label="Note (optional)"
        {...register('note', { setValueAs: (v: string) => (v ? v : undefined) })}
        error={errors.note?.message}
      />
      <Button type="submit" size="lg" className="w-full" busy={busy}>
        Log: {CELLAR_ACTION_LABELS[action]}
      </Button>
      {saved && (
        <p role="status" className="text-sm text-ink-700">
          Saved on this tablet: {saved}.
        </p>
      )}
    </form>
  );
}
