import { useRef, useState } from 'react';
import { useForm, type FieldErrors, type Resolver } from 'react-hook-form';
import { Button, SelectField, SuggestionChip, TextField, cx } from '../../../components/ui';
import {
  READING_METHOD_LABELS,
  READING_METHODS,
  readingEntrySchema,
  type ReadingEntryInput,
  type ReadingMethod,
  type ReadingView,
} from '../../../../shared/schemas/cellar';
import { showQuantity, unitBySymbol } from '../../../../shared/quantities';
import { QuantityField } from '../../../components/ui/quantity-field';
import { quantityResolver } from '../../../lib/quantity-resolver';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { show } from '../../../lib/units';
import { useLogCellarEntry } from '../api/log-cellar-entry';
import { useSubmitOnce } from '../../../lib/use-submit-once';
import { optionalNumber } from './form-values';

/** What the form holds while a person types (in SI, as the API takes it): nothing measured until typed or tapped. */
interface ReadingDraft {
  kind: 'reading';
  method?: ReadingMethod;
  sg?: number;
  brix?: number;
  originalBrix?: number;
  tempC?: number;
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
  const lastTempC = last?.tempC ?? undefined;
  // A hydrometer is read in SG or °P; the form holds SG either way.
  const [scale, setScale] = useState<'SG' | '°P'>('SG');
  const gravityUnit = unitBySymbol('gravity', unitSystem, scale);
  const { control, register, handleSubmit, watch, setValue, reset, formState } = useForm<
    ReadingDraft,
    unknown,
    ReadingEntryInput
  >({
    // The draft may lack the method and gravity; the shared schema says what is missing.
    resolver: quantityResolver(readingEntrySchema, unitSystem) as unknown as Resolver<
      ReadingDraft,
      unknown,
      ReadingEntryInput
    >,
    defaultValues: { kind: 'reading' },
  });
  const method = watch('method');
  const errors = formState.errors;
  const { once, busy } = useSubmitOnce();

  const onSubmit = once(
    handleSubmit(async (values) => {
      const gravity =
        values.brix !== undefined
          ? `${values.brix} °Bx`
          : showQuantity('gravity', unitSystem, values.sg!, { unit: gravityUnit });
      const label = `Reading ${gravity}${values.tempC !== undefined ? ` · ${show(unitSystem, 'temperature', values.tempC)}` : ''}`;
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
    // A refractometer reads °Brix, the others SG: what was typed for the other kind of instrument is dropped.
    if (m === 'refractometer') setValue('sg', undefined);
    else {
      setValue('brix', undefined);
      setValue('originalBrix', undefined);
    }
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
      {method === 'refractometer' ? (
        <QuantityField
          control={control}
          name="brix"
          label="Gravity"
          quantity="brix"
          system={unitSystem}
          optional
          className="min-h-[72px] text-reading tabular-nums"
          placeholder="12.0"
        />
      ) : (
        <div className="grid grid-cols-[1fr_auto] items-end gap-3">
          <QuantityField
            control={control}
            name="sg"
            label="Gravity"
            quantity="gravity"
            system={unitSystem}
            unit={gravityUnit}
            optional
            className="min-h-[72px] text-reading tabular-nums"
            placeholder={scale === 'SG' ? (last ? last.sg.toFixed(3) : '1.050') : '12.0'}
          />
          <SelectField
            label="Unit"
            className="min-h-[72px] text-lg"
            value={scale}
            onChange={(e) => setScale(e.target.value === '°P' ? '°P' : 'SG')}
          >
            <option value="SG">SG</option>
            <option value="°P">°P</option>
          </SelectField>
        </div>
      )}
      {method === 'refractometer' && (
        <div className="space-y-2">
          <QuantityField
            control={control}
            name="originalBrix"
            label="Reading at knockout"
            hint="Leave empty for unfermented wort; with it, the reading is corrected for alcohol."
            quantity="brix"
            system={unitSystem}
            optional
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
          <QuantityField
            control={control}
            name="tempC"
            label="Temperature"
            quantity="temperature"
            system={unitSystem}
            optional
            className="min-h-[56px] text-2xl tabular-nums"
          />
          {lastTempC !== undefined && (
            <SuggestionChip label="Last" onPick={() => setValue('tempC', lastTempC)}>
              {show(unitSystem, 'temperature', lastTempC)}
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
