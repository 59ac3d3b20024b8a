import { useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button, SelectField, SuggestionChip, TextField } from '../../../components/ui';
import {
  actionEntrySchema,
  CELLAR_ACTION_LABELS,
  CELLAR_ACTIONS,
  onlyActionFields,
  type ActionEntryInput,
  type CellarAction,
  type CellarPlanView,
  type TempUnit,
  type VesselView,
} from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { displayUnit } from '../../../lib/units';
import { useLogCellarEntry } from '../api/log-cellar-entry';
import { useVessels } from '../../../lib/vessels';
import { useSubmitOnce } from '../../../lib/use-submit-once';
import { optionalNumber } from './form-values';

const ACTIONS_HERE = CELLAR_ACTIONS.filter((a) => a !== 'carbonation'); // carbonation is set from its own panel

/** What the form holds while a person types: every kind's fields; only the chosen kind's are checked and sent. */
interface ActionDraft {
  kind: 'action';
  action: CellarAction | '';
  temp?: number;
  tempUnit: TempUnit;
  detail?: string;
  volume?: number;
  volumeUnit: 'l' | 'bbl';
  toVesselId?: number;
  note?: string;
}

// The draft is flat; the shared schema is per kind and refuses what another kind takes.
const entryResolver = zodResolver(actionEntrySchema) as unknown as Resolver<ActionDraft, unknown, ActionEntryInput>;

/** Logs D-rest, cold crash, dry hop, fining or a transfer as a signed entry through the outbox; empty again once kept. */
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
  const { register, handleSubmit, watch, setValue, reset, formState } = useForm<ActionDraft, unknown, ActionEntryInput>(
    {
      resolver: (draft, context, options) => entryResolver(onlyActionFields(draft) as ActionDraft, context, options),
      defaultValues: {
        kind: 'action',
        action: '',
        tempUnit: unitSystem === 'us' ? 'f' : 'c',
        volumeUnit: unitSystem === 'us' ? 'bbl' : 'l',
      },
    },
  );
  const action = watch('action');
  const errors = formState.errors;
  const planTempC = action === 'd_rest' ? plan.dRestTempC : action === 'cold_crash' ? plan.crashTempC : undefined;
  const tanks = (vessels.data ?? []).filter(
    (v: VesselView) => v.type === 'bright_tank' && (v.currentBatchId === null || v.currentBatchId === batchId),
  );

  const { once, busy } = useSubmitOnce();
  const onSubmit = once(
    handleSubmit(async (entry) => {
      const label = CELLAR_ACTION_LABELS[entry.action];
      await log(entry, label);
      setSaved(label);
      reset();
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Log cellar work" className="space-y-3">
      <SelectField label="What was done" {...register('action')} error={errors.action?.message}>
        <option value="">Choose…</option>
        {ACTIONS_HERE.map((a) => (
          <option key={a} value={a}>
            {CELLAR_ACTION_LABELS[a]}
          </option>
        ))}
      </SelectField>
      {(action === 'd_rest' || action === 'cold_crash') && (
        <div className="space-y-2">
          <TextField
            label={`Set temperature (${temp.unit})`}
            inputMode="decimal"
            className="text-2xl"
            {...register('temp', { setValueAs: optionalNumber })}
            error={errors.temp?.message}
          />
          {planTempC !== undefined && (
            <SuggestionChip
              label="Plan"
              onPick={() => setValue('temp', Number(temp.fromSi(planTempC).toFixed(1)), { shouldValidate: true })}
            >
              {temp.fromSi(planTempC).toFixed(1)} {temp.unit}
            </SuggestionChip>
          )}
        </div>
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
        {action ? `Log: ${CELLAR_ACTION_LABELS[action]}` : 'Log cellar work'}
      </Button>
      {saved && (
        <p role="status" className="text-sm text-ink-700">
          Saved on this tablet: {saved}.
        </p>
      )}
    </form>
  );
}
