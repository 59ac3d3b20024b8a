import { useRef, useState } from 'react';
import { useForm, type FieldErrors, type Resolver } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button, SelectField, SuggestionChip, TextField, cx } from '../../../components/ui';
import {
  READING_METHOD_LABELS,
  READING_METHODS,
  readingEntrySchema,
  type GravityUnit,
  type ReadingEntryInput,
  type ReadingMethod,
  type ReadingView,
  type TempUnit,
} from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { displayUnit } from '../../../lib/units';
import { useLogCellarEntry } from '../api/log-cellar-entry';
import { useSubmitOnce } from '../../../lib/use-submit-once';
import { optionalNumber } from './form-values';

const UNIT_LABEL = { sg: 'SG', plato: '°P', brix: '°Bx' } as const;

/** What the form holds while a person types: nothing measured until they type or tap it. */
interface ReadingDraft {
  kind: 'reading';
  method?: ReadingMethod;
  gravity?: number;
  gravityUnit: GravityUnit;
  originalBrix?: number;
  temp?: number;
  tempUnit: TempUnit;
  ph?: number;
  note?: string;
}

/**
 * The method most of the batch's hand readings were taken with, offered as a mark on its button. A probe
 * import is not a hand reading, so a file of probe rows never makes the next hand reading a probe's.
 */
function usualMethod(readings: ReadingView[]): ReadingMethod | undefined {
  const counts = new Map<ReadingMethod, number>();
  for (const r of readings) if (r.method !== 'probe') counts.set(r.method, (counts.get(r.method) ?? 0) + 1);
  return [...counts].sort((a, b) => b[1] - a[1])[0]?.[0];
}

/** One-thumb gravity entry for the tablet: big numerals, the last values as one-tap suggestions, sent through the outbox. */
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
  const usual = usualMethod(readings);
  const knockoutBrix = readings.find((r) => r.enteredUnit === 'brix')?.enteredValue;
  const temp = displayUnit('temperature', unitSystem);
  const lastTemp = last?.tempC === null || last?.tempC === undefined ? undefined : temp.fromSi(last.tempC).toFixed(1);
  const { register, handleSubmit, watch, setValue, reset, formState } = useForm<
    ReadingDraft,
    unknown,
    ReadingEntryInput
  >({
    // The draft may lack the method and gravity; the shared schema says what is missing.
    resolver: zodResolver(readingEntrySchema) as unknown as Resolver<ReadingDraft, unknown, ReadingEntryInput>,
    defaultValues: { kind: 'reading', gravityUnit: 'sg', tempUnit: unitSystem === 'us' ? 'f' : 'c' },
  });
  const method = watch('method');
  const gravityUnit = watch('gravityUnit');
  const errors = formState.errors;
  const { once, busy } = useSubmitOnce();

  const onSubmit = once(
    handleSubmit(async (values) => {
      const label = `Reading ${values.gravity} ${UNIT_LABEL[values.gravityUnit]}${values.temp !== undefined ? ` · ${values.temp} ${temp.unit}` : ''}`;
      await log(values, label);
      setSaved(label);
      reset();
    }, focusMissingMethod),
  );
  const methods = useRef<HTMLDivElement>(null);
  /** A method left unchosen has no field to focus: bring its buttons and their message into view on a phone. */
  function focusMissingMethod(invalid: FieldErrors<ReadingDraft>) {
    if (invalid.method) methods.current?.querySelector('button')?.focus();
  }
  const choose = (m: ReadingMethod) => {
    setValue('method', m, { shouldValidate: formState.isSubmitted });
    setValue('gravityUnit', m === 'refractometer' ? 'brix' : gravityUnit === 'brix' ? 'sg' : gravityUnit);
    if (m !== 'refractometer') setValue('originalBrix', undefined);
  };

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Log a reading" className="space-y-4">
      <fieldset>
        <legend className="mb-1 text-sm font-semibold text-ink-700">Measured with</legend>
        <div ref={methods} className="grid grid-cols-3 gap-2">
          {READING_METHODS.map((m) => (
            <button
              key={m}
              type="button"
              aria-pressed={method === m}
              onClick={() => choose(m)}
              className={cx(
                'min-h-[56px] rounded-lg border-2 px-1 text-sm font-semibold',
                method === m
                  ? 'border-cellar-800 bg-cellar-800 text-white'
                  : usual === m
                    ? 'border-dashed border-brass-500 bg-brass-100 text-ink-900'
                    : 'border-mist-300 bg-white text-ink-700',
              )}
            >
              {READING_METHOD_LABELS[m]}
              {usual === m && <span className="block text-xs font-normal"> usual</span>}
            </button>
          ))}
        </div>
        {errors.method && (
          <p role="alert" className="mt-1 text-sm font-medium text-ember-700">
            {errors.method.message}
          </p>
        )}
      </fieldset>
      <div className="grid grid-cols-[1fr_auto] items-end gap-3">
        <TextField
          label={`Gravity (${UNIT_LABEL[gravityUnit]})`}
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
        <div className="space-y-2">
          <TextField
            label="Reading at knockout (°Bx)"
            hint="Leave empty for unfermented wort; with it, the reading is corrected for alcohol."
            inputMode="decimal"
            {...register('originalBrix', { setValueAs: optionalNumber })}
            error={errors.originalBrix?.message}
          />
          {knockoutBrix !== undefined && (
            <SuggestionChip label="First reading" onPick={() => setValue('originalBrix', knockoutBrix)}>
              {knockoutBrix} °Bx
            </SuggestionChip>
          )}
        </div>
      )}
      <div className="grid grid-cols-2 gap-3">
        <div className="space-y-2">
          <TextField
            label={`Temperature (${temp.unit})`}
            inputMode="decimal"
            className="min-h-[56px] text-2xl tabular-nums"
            {...register('temp', { setValueAs: optionalNumber })}
            error={errors.temp?.message}
          />
          {lastTemp !== undefined && (
            <SuggestionChip label="Last" onPick={() => setValue('temp', Number(lastTemp))}>
              {lastTemp} {temp.unit}
            </SuggestionChip>
          )}
        </div>
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
