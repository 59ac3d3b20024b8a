import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button, SelectField, TextField, cx } from '../../../components/ui';
import {
  READING_METHOD_LABELS,
  READING_METHODS,
  readingEntrySchema,
  type ReadingEntryInput,
  type ReadingView,
} from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { displayUnit } from '../../../lib/units';
import { useLogCellarEntry } from '../api/log-cellar-entry';

import { optionalNumber } from './form-values';
import { useSubmitOnce } from '../../../lib/use-submit-once';
const UNIT_LABEL = { sg: 'SG', plato: '°P', brix: '°Bx' } as const;

/** The last values, so a routine reading is one number and one tap. */
function defaults(
  last: ReadingView | undefined,
  unitSystem: UnitSystem,
  firstBrix: number | undefined,
): Partial<ReadingEntryInput> {
  const tempUnit = unitSystem === 'us' ? 'f' : 'c';
  const method = last?.method ?? 'hydrometer';
  return {
    kind: 'reading',
    method,
    gravityUnit: last?.enteredUnit ?? 'sg',
    tempUnit,
    temp:
      last?.tempC === null || last?.tempC === undefined
        ? undefined
        : Number(displayUnit('temperature', unitSystem).fromSi(last.tempC).toFixed(1)),
    originalBrix: method === 'refractometer' ? firstBrix : undefined,
  };
}

/** One-thumb gravity entry for the tablet: big numerals, last values prefilled, sent through the outbox. */
export function ReadingForm({
  batchId,
  readings,
  unitSystem,
}: {
  batchId: number;
  readings: ReadingView[];
  unitSystem: UnitSystem;
}) {
  const log = useLogCellarEntry(batchId);
  const [saved, setSaved] = useState<string>();
  const last = readings[readings.length - 1];
  const firstBrix = readings.find((r) => r.enteredUnit === 'brix')?.enteredValue;
  const { register, handleSubmit, watch, setValue, reset, formState } = useForm<ReadingEntryInput>({
    resolver: zodResolver(readingEntrySchema),
    defaultValues: defaults(last, unitSystem, firstBrix),
  });
  const method = watch('method');
  const gravityUnit = watch('gravityUnit');
  const tempUnit = displayUnit('temperature', unitSystem).unit;
  const errors = formState.errors;
  const { once, busy } = useSubmitOnce();

  const onSubmit = once(
    handleSubmit(async (values) => {
      const label = `Reading ${values.gravity} ${UNIT_LABEL[values.gravityUnit]}${values.temp !== undefined ? ` · ${values.temp} ${tempUnit}` : ''}`;
      await log(values, label);
      setSaved(label);
      reset({ ...values, gravity: undefined as unknown as number, ph: undefined, note: undefined });
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Log a reading" className="space-y-4">
      <fieldset>
        <legend className="mb-1 text-sm font-semibold text-ink-700">Measured with</legend>
        <div className="grid grid-cols-3 gap-2">
          {READING_METHODS.map((m) => (
            <button
              key={m}
              type="button"
              aria-pressed={method === m}
              onClick={() => {
                setValue('method', m);
                setValue('gravityUnit', m === 'refractometer' ? 'brix' : gravityUnit === 'brix' ? 'sg' : gravityUnit);
                if (m === 'refractometer') setValue('originalBrix', firstBrix);
                else setValue('originalBrix', undefined);
              }}
              className={cx(
                'min-h-[56px] rounded-lg border-2 px-1 text-sm font-semibold',
                method === m ? 'border-cellar-800 bg-cellar-800 text-white' : 'border-mist-300 bg-white text-ink-700',
              )}
            >
              {READING_METHOD_LABELS[m]}
            </button>
          ))}
        </div>
      </fieldset>
      <div className="grid grid-cols-[1fr_auto] items-end gap-3">
        <TextField
          label={`Gravity (${UNIT_LABEL[gravityUnit ?? 'sg']})`}
          inputMode="decimal"
          autoComplete="off"
          className="min-h-[72px] text-reading tabular-nums"
          placeholder={gravityUnit === 'sg' ? (last ? last.sg.toFixed(3) : '1.050') : '12.0'}
          {...register('gravity', { setValueAs: optionalNumber })}
          error={errors.gravity?.message}
        />
        {method !== 'refractometer' && (
          <SelectField
            label="Unit"
            className="min-h-[72px] text-lg"
            {...register('gravityUnit')}
            error={errors.gravityUnit?.message}
          >
            <option value="sg">SG</option>
            <option value="plato">°P</option>
          </SelectField>
        )}
      </div>
      {method === 'refractometer' && (
        <TextField
          label="Reading at knockout (°Bx)"
          hint="Leave empty for unfermented wort; with it, the reading is corrected for alcohol."
          inputMode="decimal"
          {...register('originalBrix', { setValueAs: optionalNumber })}
          error={errors.originalBrix?.message}
        />
      )}
      <div className="grid grid-cols-2 gap-3">
        <TextField
          label={`Temperature (${tempUnit})`}
          inputMode="decimal"
          className="min-h-[56px] text-2xl tabular-nums"
          {...register('temp', { setValueAs: optionalNumber })}
          error={errors.temp?.message}
        />
        <TextField
          label="pH (optional)"
          inputMode="decimal"
          className="min-h-[56px] text-2xl tabular-nums"
          {...register('ph', { setValueAs: optionalNumber })}
          error={errors.ph?.message}
        />
      </div>
      <TextField
        label="Note (optional)"
        {...register('note', { setValueAs: (v: string) => (v ? v : undefined) })}
        error={errors.note?.message}
      />
      {errors.gravityUnit && method === 'refractometer' && (
        <p className="text-sm text-ember-700">{errors.gravityUnit.message}</p>
      )}
      <Button type="submit" size="xl" className="w-full" busy={busy}>
        Save reading
      </Button>
      {saved && (
        <p role="status" className="text-sm text-ink-700">
          Saved on this tablet: {saved}. It is sent as soon as the network allows.
        </p>
      )}
    </form>
  );
}
