import { useState, type ChangeEvent } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button, SelectField, TextField } from '../../../components/ui';
import {
  containerSize,
  KEG_SIZE_LABELS,
  KEG_SIZES_OFFERED,
  packageName,
  packagingEntrySchema,
  type BatchCellarView,
  type PackagingEntryInput,
} from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { useLogCellarEntry } from '../api/log-cellar-entry';
import { useSubmitOnce } from '../../../lib/use-submit-once';
import { PackagingSummary } from './packaging-summary';

const CONTAINER_SIZES_ML = [355, 473, 500, 330, 750];

/**
 * A new line's count, left for the person to type (the schema asks for it): a run is signed with what was
 * packaged, never with a number the form put there.
 */
const UNCOUNTED = { count: undefined } as unknown as { count: number };

/** Packaging runs, what is packaged so far and what is still in the tank; losses once the batch is packaged. */
export function PackagingForm({
  batchId,
  packaging,
  unitSystem,
}: {
  batchId: number;
  packaging: BatchCellarView['packaging'];
  unitSystem: UnitSystem;
}) {
  const log = useLogCellarEntry(batchId);
  const [saved, setSaved] = useState<string>();
  const { register, control, handleSubmit, watch, reset, formState, getValues } = useForm<PackagingEntryInput>({
    resolver: zodResolver(packagingEntrySchema),
    defaultValues: {
      kind: 'packaging',
      lines: [{ kind: 'keg', size: unitSystem === 'us' ? 'half_bbl' : 'keg_50l', ...UNCOUNTED }],
      final: false,
    },
  });
  const lines = useFieldArray({ control, name: 'lines' });
  const kinds = watch('lines');

  const { once, busy } = useSubmitOnce();
  const onSubmit = once(
    handleSubmit(async (values) => {
      const label = `Packaging · ${values.lines.map((l) => `${l.count} × ${packageName(unitSystem, l.kind, l.kind === 'keg' ? l.size : l.sizeMl)}`).join(', ')}`;
      await log(values, label);
      setSaved(label);
      reset();
    }),
  );

  return (
    <div className="space-y-4">
      <PackagingSummary packaging={packaging} unitSystem={unitSystem} />
      <form onSubmit={onSubmit} noValidate aria-label="Log a packaging run" className="space-y-3">
        {lines.fields.map((field, i) => (
          <div key={field.id} className="grid grid-cols-[8rem_1fr_7rem_auto] items-end gap-2">
            <SelectField
              label="Package"
              {...register(`lines.${i}.kind`, {
                // Keg lines carry a keg size, can and bottle lines a size in mL: swap the whole line.
                onChange: (e: ChangeEvent<HTMLSelectElement>) => {
                  const count = getValues(`lines.${i}.count`);
                  const kind = e.target.value;
                  lines.update(
                    i,
                    kind === 'keg'
                      ? { kind: 'keg', size: 'half_bbl', count }
                      : { kind: kind === 'bottle' ? 'bottle' : 'can', sizeMl: 355, count },
                  );
                },
              })}
            >
              <option value="keg">Keg</option>
              <option value="can">Can</option>
              <option value="bottle">Bottle</option>
            </SelectField>
            {kinds[i]?.kind === 'keg' ? (
              <SelectField label="Size" {...register(`lines.${i}.size` as const)}>
                {KEG_SIZES_OFFERED[unitSystem].map((s) => (
                  <option key={s} value={s}>
                    {KEG_SIZE_LABELS[s]}
                  </option>
                ))}
              </SelectField>
            ) : (
              <SelectField label="Size" {...register(`lines.${i}.sizeMl` as const, { valueAsNumber: true })}>
                {CONTAINER_SIZES_ML.map((ml) => (
                  <option key={ml} value={ml}>
                    {containerSize(unitSystem, ml)}
                  </option>
                ))}
              </SelectField>
            )}
            <TextField
              label="Count"
              inputMode="numeric"
              {...register(`lines.${i}.count`, { valueAsNumber: true })}
              error={formState.errors.lines?.[i]?.count?.message}
            />
            <Button
              variant="quiet"
              onClick={() => lines.remove(i)}
              disabled={lines.fields.length === 1}
              aria-label={`Remove line ${i + 1}`}
            >
              ✕
            </Button>
          </div>
        ))}
        {formState.errors.lines?.message && <p className="text-sm text-ember-700">{formState.errors.lines.message}</p>}
        <Button
          variant="secondary"
          // A new line repeats the package of the line above: a run is mostly more of the same.
          onClick={() => {
            const { count: _count, ...previous } = getValues(`lines.${lines.fields.length - 1}`);
            lines.append({ ...previous, ...UNCOUNTED });
          }}
        >
          Add a line
        </Button>
        <label className="flex min-h-touch items-center gap-3 text-base">
          <input type="checkbox" className="h-6 w-6" {...register('final')} />
          Last run: the tank is empty and the batch is packaged
        </label>
        <Button type="submit" size="lg" className="w-full" busy={busy}>
          Log packaging run
        </Button>
        {saved && (
          <p role="status" className="text-sm text-ink-700">
            Saved on this tablet: {saved}.
          </p>
        )}
      </form>
    </div>
  );
}
