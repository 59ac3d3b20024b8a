import { useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { Button, SelectField, SuggestionChip, TextField } from '../../../components/ui';
import {
  actionEntrySchema,
  CELLAR_ACTION_LABELS,
  CELLAR_ACTIONS,
  onlyActionFields,
  type ActionEntryInput,
  type CellarAction,
  type CellarPlanView,
  type VesselView,
} from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { show } from '../../../lib/units';
import { QUANTITIES } from '../../../../shared/quantities';
import { QuantityField } from '../../../components/ui/quantity-field';
import { quantityResolver } from '../../../lib/quantity-resolver';
import { useLogCellarEntry } from '../api/log-cellar-entry';
import { useVessels } from '../../../lib/vessels';
import { useSubmitOnce } from '../../../lib/use-submit-once';
import { optionalNumber } from './form-values';

const ACTIONS_HERE = CELLAR_ACTIONS.filter((a) => a !== 'carbonation'); // carbonation is set from its own panel

/** What the form holds while a person types: every kind's fields; only the chosen kind's are checked and sent. */
interface ActionDraft {
  kind: 'action';
  action: CellarAction | '';
  tempC?: number;
  detail?: string;
  volumeL?: number;
  toVesselId?: number;
  note?: string;
}

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
  // The draft is flat; the shared schema is per kind and refuses what another kind takes.
  const entryResolver = quantityResolver(actionEntrySchema, unitSystem) as unknown as Resolver<
    ActionDraft,
    unknown,
    ActionEntryInput
  >;
  // A transfer is said in barrels (US) or hectolitres (metric), as a tank's contents are.
  const volumeUnit = QUANTITIES.volume.units[unitSystem][1];
  const { control, register, handleSubmit, watch, setValue, reset, formState } = useForm<
    ActionDraft,
    unknown,
    ActionEntryInput
  >({
    resolver: (draft, context, options) => entryResolver(onlyActionFields(draft) as ActionDraft, context, options),
    defaultValues: { kind: 'action', action: '' },
  });
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
          <QuantityField
            control={control}
            name="tempC"
            label="Set temperature"
            quantity="temperature"
            system={unitSystem}
            optional
            className="text-2xl"
          />
          {planTempC !== undefined && (
            <SuggestionChip label="Plan" onPick={() => setValue('tempC', planTempC, { shouldValidate: true })}>
              {show(unitSystem, 'temperature', planTempC)}
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
        <div className="space-y-3">
          <QuantityField
            control={control}
            name="volumeL"
            label="Volume moved"
            quantity="volume"
            system={unitSystem}
            unit={volumeUnit}
            optional
            className="text-2xl"
          />
          <div>
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
