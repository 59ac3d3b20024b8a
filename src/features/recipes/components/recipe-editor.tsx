import { useRef, useState, type ChangeEvent, type ReactNode } from 'react';
import {
  useController,
  useFieldArray,
  useForm,
  useWatch,
  type Control,
  type UseFormRegister,
  type UseFormSetValue,
  type FieldErrors,
} from 'react-hook-form';
import type { z } from 'zod';
import {
  TYPICAL_SUGAR_PCT,
  convertDoseRule,
  doseBasisLabel,
  doseUnitLabel,
  percentagesFromWeights,
} from '../../../../shared/brewing';
import {
  ADJUNCT_CATEGORIES,
  ADJUNCT_STAGES,
  DOSE_BASES,
  FERMENTABLE_STAGES,
  HOP_FORMS,
  HOP_USES,
  MASH_METHODS,
  RECIPE_STATUSES,
  SALT_IDS,
  SALT_LABELS,
  YEAST_TYPES,
  createRecipeSchema,
  type CreateRecipeInput,
  type IngredientKind,
} from '../../../../shared/schemas/recipes';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { Button, Card, SelectField, TextAreaField, TextField, cx } from '../../../components/ui';
import type { EquipmentRow, IngredientRow } from '../../../../shared/contract/recipes';
import { LiveNumbersPanel, NumbersBar, useLiveNumbers } from './live-numbers';
import { showAdjunct } from './scale-view';
import { quantityResolver } from '../../../lib/quantity-resolver';
import { QuantityField, asNumber } from '../../../components/ui/quantity-field';
import { displayUnit, show, showVolume } from '../../../lib/units';
import { FormBanner } from '../../../components/ui/form-banner';

type FormIn = z.input<typeof createRecipeSchema>;
type Ctl = Control<FormIn, unknown, CreateRecipeInput>;

const HOP_USE_LABELS: Record<(typeof HOP_USES)[number], string> = {
  boil: 'Boil',
  whirlpool: 'Whirlpool',
  dryHop: 'Dry hop',
};
const STAGE_LABELS: Record<string, string> = {
  mash: 'Mash',
  kettle: 'Kettle (sugar)',
  fermenter: 'Fermenter',
  boil: 'Boil',
  whirlpool: 'Whirlpool',
  packaging: 'Packaging',
};
const METHOD_LABELS: Record<(typeof MASH_METHODS)[number], string> = {
  infusion: 'Hot water infusion',
  directHeat: 'Direct heat',
  recirculate: 'Recirculate through HLT coil',
};
const ION_LABELS = [
  ['calciumPpm', 'Ca'],
  ['magnesiumPpm', 'Mg'],
  ['sodiumPpm', 'Na'],
  ['sulfatePpm', 'SO₄'],
  ['chloridePpm', 'Cl'],
  ['bicarbonatePpm', 'HCO₃'],
] as const;

/** Reads a nested field error by dotted path (react-hook-form's error tree). */
function errorAt(errors: FieldErrors<FormIn>, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split('.')) node = (node as Record<string, unknown> | undefined)?.[key];
  return (node as { message?: string } | undefined)?.message;
}

function Section({ title, children, action }: { title: string; children: ReactNode; action?: ReactNode }) {
  return (
    <Card className="space-y-4">
      <div className="flex items-center justify-between gap-2">
        <h2 className="text-xl font-bold">{title}</h2>
        {action}
      </div>
      {children}
    </Card>
  );
}

function Row({
  legend,
  children,
  onRemove,
  disabled,
}: {
  legend: string;
  children: ReactNode;
  onRemove: () => void;
  disabled: boolean;
}) {
  return (
    <fieldset className="rounded-lg border border-mist-200 p-3">
      <legend className="px-1 text-sm font-semibold text-ink-700">{legend}</legend>
      <div className="flex flex-wrap items-end gap-3">
        {children}
        {!disabled && (
          <Button variant="quiet" onClick={onRemove} aria-label={`Remove ${legend.toLowerCase()}`}>
            Remove
          </Button>
        )}
      </div>
    </fieldset>
  );
}

const w = (cls: string, node: ReactNode) => <div className={cls}>{node}</div>;

interface Shared {
  control: Ctl;
  register: UseFormRegister<FormIn>;
  /** Picking a library name fills its typical values into the line. */
  fromLibrary: (kind: IngredientKind, name: string) => IngredientRow | undefined;
  setValue: UseFormSetValue<FormIn>;
  errors: FieldErrors<FormIn>;
  system: UnitSystem;
  disabled: boolean;
}

function GrainBill({
  control,
  register,
  errors,
  system,
  disabled,
  ogNow,
  weightsNow,
  setBill,
  fromLibrary,
  setValue,
}: Shared & { ogNow?: number; weightsNow?: number[]; setBill: (bill: FormIn['content']['grainBill']) => void }) {
  const bill = useWatch({ control, name: 'content.grainBill' });
  const items = useFieldArray({ control, name: 'content.grainBill.items' });
  const mode = bill.mode;
  const switchMode = (next: 'weight' | 'percent') => {
    if (next === mode || !weightsNow || !ogNow) return;
    const specs = bill.items.map(({ name, potential, colourLovibond, stage }) => ({
      name,
      potential,
      colourLovibond,
      stage,
    }));
    if (next === 'percent') {
      const pct = percentagesFromWeights(weightsNow);
      setBill({
        mode: 'percent',
        targetOg: Number(ogNow.toFixed(3)),
        items: specs.map((s, i) => ({ ...s, percent: Number(pct[i]!.toFixed(2)) })),
      });
    } else {
      setBill({ mode: 'weight', items: specs.map((s, i) => ({ ...s, weightKg: weightsNow[i]! })) });
    }
  };
  return (
    <Section
      title="Grain bill"
      action={
        <div role="radiogroup" aria-label="Grain bill written as" className="flex gap-1">
          {(['weight', 'percent'] as const).map((m) => (
            <Button
              key={m}
              variant={mode === m ? 'primary' : 'secondary'}
              aria-pressed={mode === m}
              disabled={disabled || !weightsNow}
              onClick={() => switchMode(m)}
            >
              {m === 'weight' ? 'By weight' : 'By share + OG'}
            </Button>
          ))}
        </div>
      }
    >
      {mode === 'percent' &&
        w(
          'w-40',
          <TextField
            label="Target OG"
            type="number"
            step="0.001"
            {...register('content.grainBill.targetOg', asNumber())}
            error={errorAt(errors, 'content.grainBill.targetOg')}
            disabled={disabled}
          />,
        )}
      {items.fields.map((f, i) => {
        const p = `content.grainBill.items.${i}` as const;
        const potential = bill.items[i]?.potential;
        const byPpg = potential && 'ppg' in potential;
        return (
          <Row key={f.id} legend={`Fermentable ${i + 1}`} onRemove={() => items.remove(i)} disabled={disabled}>
            {w(
              'min-w-48 flex-1',
              <TextField
                label="Name"
                list="kw-library-fermentable"
                {...register(`${p}.name`, {
                  onChange: (e: ChangeEvent<HTMLInputElement | HTMLSelectElement>) => {
                    const hit = fromLibrary('fermentable', e.target.value);
                    if (hit?.ppg != null) setValue(`${p}.potential`, { ppg: hit.ppg }, { shouldValidate: true });
                    if (hit?.colourLovibond != null)
                      setValue(`${p}.colourLovibond`, hit.colourLovibond, { shouldValidate: true });
                  },
                })}
                error={errorAt(errors, `${p}.name`)}
                disabled={disabled}
              />,
            )}
            {w(
              'w-28',
              byPpg ? (
                <TextField
                  label="Potential (ppg)"
                  type="number"
                  step="any"
                  {...register(`${p}.potential.ppg` as never, asNumber())}
                  error={errorAt(errors, `${p}.potential.ppg`)}
                  disabled={disabled}
                />
              ) : (
                <TextField
                  label="Extract (%)"
                  type="number"
                  step="any"
                  {...register(`${p}.potential.extractPct` as never, asNumber())}
                  error={errorAt(errors, `${p}.potential.extractPct`)}
                  disabled={disabled}
                />
              ),
            )}
            {w(
              'w-24',
              <TextField
                label="Colour (°L)"
                type="number"
                step="any"
                {...register(`${p}.colourLovibond`, asNumber())}
                error={errorAt(errors, `${p}.colourLovibond`)}
                disabled={disabled}
              />,
            )}
            {w(
              'w-44',
              <SelectField label="Goes in" {...register(`${p}.stage`)} disabled={disabled}>
                {FERMENTABLE_STAGES.map((s) => (
                  <option key={s} value={s}>
                    {STAGE_LABELS[s]}
                  </option>
                ))}
              </SelectField>,
            )}
            {mode === 'weight'
              ? w(
                  'w-32',
                  <QuantityField
                    control={control}
                    name={`${p}.weightKg` as never}
                    label="Weight"
                    quantity="grainWeight"
                    system={system}
                    disabled={disabled}
                  />,
                )
              : w(
                  'w-28',
                  <TextField
                    label="Share (%)"
                    type="number"
                    step="any"
                    {...register(`${p}.percent` as never, asNumber())}
                    error={errorAt(errors, `${p}.percent`)}
                    disabled={disabled}
                  />,
                )}
          </Row>
        );
      })}
      {!disabled && (
        <Button
          variant="secondary"
          onClick={() =>
            items.append(
              mode === 'weight'
                ? { name: '', potential: { ppg: 37 }, colourLovibond: 2, stage: 'mash', weightKg: 1 }
                : ({ name: '', potential: { ppg: 37 }, colourLovibond: 2, stage: 'mash', percent: 5 } as never),
            )
          }
        >
          Add a fermentable
        </Button>
      )}
    </Section>
  );
}

function Hops({
  control,
  register,
  errors,
  system,
  disabled,
  ibus,
  solvedWeights,
  targetIbu,
  fromLibrary,
  setValue,
}: Shared & { ibus?: number[]; solvedWeights?: number[]; targetIbu?: number }) {
  const hops = useFieldArray({ control, name: 'content.hops' });
  const values = useWatch({ control, name: 'content.hops' });
  return (
    <Section title="Hops">
      {hops.fields.map((f, i) => {
        const p = `content.hops.${i}` as const;
        const use = values[i]?.use;
        return (
          <Row key={f.id} legend={`Hop ${i + 1}`} onRemove={() => hops.remove(i)} disabled={disabled}>
            {w(
              'min-w-64 flex-1',
              <TextField
                label="Variety"
                list="kw-library-hop"
                {...register(`${p}.name`, {
                  onChange: (e: ChangeEvent<HTMLInputElement | HTMLSelectElement>) => {
                    const hit = fromLibrary('hop', e.target.value);
                    if (hit?.alphaAcidPct != null)
                      setValue(`${p}.alphaAcidPct`, hit.alphaAcidPct, { shouldValidate: true });
                  },
                })}
                error={errorAt(errors, `${p}.name`)}
                disabled={disabled}
              />,
            )}
            {w(
              'w-24',
              <TextField
                label="Alpha (%)"
                type="number"
                step="any"
                {...register(`${p}.alphaAcidPct`, asNumber())}
                error={errorAt(errors, `${p}.alphaAcidPct`)}
                disabled={disabled}
              />,
            )}
            {w(
              'w-32',
              <SelectField label="Form" {...register(`${p}.form`)} disabled={disabled}>
                {HOP_FORMS.map((x) => (
                  <option key={x} value={x}>
                    {x[0]!.toUpperCase() + x.slice(1)}
                  </option>
                ))}
              </SelectField>,
            )}
            {w(
              'w-40',
              <SelectField label="Use" {...register(`${p}.use`)} disabled={disabled}>
                {HOP_USES.map((x) => (
                  <option key={x} value={x}>
                    {HOP_USE_LABELS[x]}
                  </option>
                ))}
              </SelectField>,
            )}
            {use !== 'dryHop' &&
              w(
                'w-24',
                <TextField
                  label={use === 'whirlpool' ? 'Stand (min)' : 'Minutes left'}
                  type="number"
                  step="any"
                  {...register(`${p}.minutes`, asNumber())}
                  error={errorAt(errors, `${p}.minutes`)}
                  disabled={disabled}
                />,
              )}
            {use === 'whirlpool' &&
              w(
                'w-32',
                <QuantityField
                  control={control}
                  name={`${p}.whirlpoolTempC`}
                  label="Stand temp"
                  quantity="temperature"
                  system={system}
                  optional
                  disabled={disabled}
                />,
              )}
            {w(
              'w-40',
              <SelectField
                label="Amount by"
                value={values[i]?.ibuSharePct === undefined ? 'weight' : 'share'}
                disabled={disabled || use === 'dryHop'}
                onChange={(e) => {
                  const share =
                    e.target.value === 'share' && targetIbu && ibus?.[i] !== undefined
                      ? Number(((ibus[i] / targetIbu) * 100).toFixed(1))
                      : undefined;
                  setValue(`${p}.ibuSharePct`, e.target.value === 'share' ? share || 10 : undefined, {
                    shouldValidate: true,
                  });
                }}
              >
                <option value="weight">Weight</option>
                <option value="share">Share of target IBU</option>
              </SelectField>,
            )}
            {values[i]?.ibuSharePct === undefined
              ? w(
                  'w-32',
                  <QuantityField
                    control={control}
                    name={`${p}.weightG`}
                    label="Weight"
                    quantity="hopWeight"
                    system={system}
                    disabled={disabled}
                  />,
                )
              : w(
                  'w-32',
                  <TextField
                    label="Share of IBU (%)"
                    type="number"
                    step="any"
                    {...register(`${p}.ibuSharePct`, asNumber(true))}
                    error={errorAt(errors, `${p}.ibuSharePct`)}
                    disabled={disabled}
                  />,
                )}
            {values[i]?.ibuSharePct !== undefined && solvedWeights?.[i] !== undefined && (
              <p className="min-h-touch pb-2 font-semibold tabular-nums" aria-label={`Hop ${i + 1} solved weight`}>
                = {show(system, 'hopWeight', solvedWeights[i])}
              </p>
            )}
            <div className="min-h-touch pb-2 text-sm text-ink-500" aria-label={`Hop ${i + 1} IBU`}>
              {ibus?.[i] !== undefined ? `${ibus[i].toFixed(1)} IBU` : ''}
            </div>
          </Row>
        );
      })}
      {!disabled && (
        <Button
          variant="secondary"
          onClick={() =>
            hops.append({ name: '', alphaAcidPct: 10, form: 'pellet', use: 'boil', minutes: 60, weightG: 28 })
          }
        >
          Add a hop
        </Button>
      )}
    </Section>
  );
}

function Mash({ control, register, errors, system, disabled }: Shared) {
  const steps = useFieldArray({ control, name: 'content.mash.steps' });
  const values = useWatch({ control, name: 'content.mash.steps' });
  return (
    <Section title="Mash">
      <div className="flex flex-wrap gap-3">
        {w(
          'w-40',
          <QuantityField
            control={control}
            name="content.mash.grainTempC"
            label="Grain temp"
            quantity="temperature"
            system={system}
            disabled={disabled}
          />,
        )}
        {w(
          'w-56',
          <QuantityField
            control={control}
            name="content.mash.thicknessLPerKg"
            label="Mash thickness"
            quantity="waterToGrain"
            system={system}
            optional
            disabled={disabled}
            hint="Blank: the equipment's"
          />,
        )}
      </div>
      {steps.fields.map((f, i) => {
        const p = `content.mash.steps.${i}` as const;
        return (
          <Row
            key={f.id}
            legend={i === 0 ? 'Mash-in rest' : `Step ${i + 1}`}
            onRemove={() => steps.remove(i)}
            disabled={disabled || i === 0}
          >
            {w(
              'min-w-44 flex-1',
              <TextField
                label="Name"
                {...register(`${p}.name`)}
                error={errorAt(errors, `${p}.name`)}
                disabled={disabled}
              />,
            )}
            {w(
              'w-32',
              <QuantityField
                control={control}
                name={`${p}.tempC`}
                label="Rest"
                quantity="temperature"
                system={system}
                disabled={disabled}
              />,
            )}
            {w(
              'w-24',
              <TextField
                label="Minutes"
                type="number"
                step="any"
                {...register(`${p}.minutes`, asNumber())}
                error={errorAt(errors, `${p}.minutes`)}
                disabled={disabled}
              />,
            )}
            {i > 0 &&
              w(
                'w-72',
                <SelectField label="Reached by" {...register(`${p}.method`)} disabled={disabled}>
                  {MASH_METHODS.map((x) => (
                    <option key={x} value={x}>
                      {METHOD_LABELS[x]}
                    </option>
                  ))}
                </SelectField>,
              )}
            {i > 0 &&
              values[i]?.method === 'infusion' &&
              w(
                'w-40',
                <QuantityField
                  control={control}
                  name={`${p}.infusionWaterTempC`}
                  label="Water"
                  quantity="temperature"
                  system={system}
                  optional
                  disabled={disabled}
                />,
              )}
          </Row>
        );
      })}
      {!disabled && (
        <Button
          variant="secondary"
          onClick={() => steps.append({ name: 'Mash out', tempC: 76, minutes: 10, method: 'infusion' })}
        >
          Add a step
        </Button>
      )}
    </Section>
  );
}

function Salts({ control, register, errors, disabled, vessel }: Shared & { vessel: 'mashSalts' | 'spargeSalts' }) {
  const salts = useFieldArray({ control, name: `content.water.${vessel}` as 'content.water.mashSalts' });
  const label = vessel === 'mashSalts' ? 'Mash salts' : 'Sparge salts';
  return (
    <div className="space-y-2">
      <h3 className="font-semibold">{label} (g)</h3>
      {salts.fields.map((f, i) => {
        const p = `content.water.${vessel}.${i}` as 'content.water.mashSalts.0';
        return (
          <Row
            key={f.id}
            legend={`${label.slice(0, -1)} ${i + 1}`}
            onRemove={() => salts.remove(i)}
            disabled={disabled}
          >
            {w(
              'min-w-80 flex-1',
              <SelectField label="Salt" {...register(`${p}.salt`)} disabled={disabled}>
                {SALT_IDS.map((s) => (
                  <option key={s} value={s}>
                    {SALT_LABELS[s]}
                  </option>
                ))}
              </SelectField>,
            )}
            {w(
              'w-28',
              <TextField
                label="Grams"
                type="number"
                step="any"
                {...register(`${p}.grams`, asNumber())}
                error={errorAt(errors, `${p}.grams`)}
                disabled={disabled}
              />,
            )}
          </Row>
        );
      })}
      {!disabled && (
        <Button variant="secondary" onClick={() => salts.append({ salt: 'gypsum', grams: 1 })}>
          Add a salt
        </Button>
      )}
    </div>
  );
}

function Water(props: Shared & { setWater: (w: FormIn['content']['water']) => void }) {
  const { control, register, errors, disabled, setWater } = props;
  const water = useWatch({ control, name: 'content.water' });
  const ions = (prefix: 'source' | 'target') => (
    <div className="grid grid-cols-3 gap-3 sm:grid-cols-6">
      {ION_LABELS.map(([key, label]) => (
        <TextField
          key={key}
          label={`${label} (ppm)`}
          type="number"
          step="any"
          {...register(`content.water.${prefix}.${key}` as never, asNumber())}
          error={errorAt(errors, `content.water.${prefix}.${key}`)}
          disabled={disabled}
        />
      ))}
    </div>
  );
  const mode = water?.mode ?? 'none';
  const setMode = (next: string) => {
    const source = water?.source ?? {
      calciumPpm: 0,
      magnesiumPpm: 0,
      sodiumPpm: 0,
      sulfatePpm: 0,
      chloridePpm: 0,
      bicarbonatePpm: 0,
    };
    if (next === 'none') setWater(undefined);
    else if (next === 'additions') setWater({ mode: 'additions', source, mashSalts: [], spargeSalts: [] });
    else
      setWater({ mode: 'target', source, target: { ...source }, allowedSalts: ['gypsum', 'calciumChlorideDihydrate'] });
  };
  return (
    <Section title="Water">
      {w(
        'w-96',
        <SelectField label="Water plan" value={mode} onChange={(e) => setMode(e.target.value)} disabled={disabled}>
          <option value="none">No water plan</option>
          <option value="additions">Salts I choose for mash and sparge</option>
          <option value="target">Solve salts for a target profile</option>
        </SelectField>,
      )}
      {water && (
        <>
          <h3 className="font-semibold">Source water</h3>
          {ions('source')}
        </>
      )}
      {water?.mode === 'additions' && (
        <div className="grid gap-4 lg:grid-cols-2">
          <Salts {...props} vessel="mashSalts" />
          <Salts {...props} vessel="spargeSalts" />
        </div>
      )}
      {water?.mode === 'target' && (
        <>
          <h3 className="font-semibold">Target profile</h3>
          {ions('target')}
          <fieldset>
            <legend className="font-semibold">Salts the solver may use</legend>
            <div className="mt-2 flex flex-wrap gap-3">
              {SALT_IDS.map((s) => (
                <label key={s} className="flex min-h-touch items-center gap-2">
                  <input
                    type="checkbox"
                    value={s}
                    {...register('content.water.allowedSalts' as never)}
                    disabled={disabled}
                    className="h-5 w-5"
                  />
                  {SALT_LABELS[s]}
                </label>
              ))}
            </div>
            {errorAt(errors, 'content.water.allowedSalts') && (
              <p role="alert" className="text-sm text-ember-700">
                {errorAt(errors, 'content.water.allowedSalts')}
              </p>
            )}
          </fieldset>
        </>
      )}
    </Section>
  );
}

function PreparationSteps({ control, index, disabled }: { control: Ctl; index: number; disabled: boolean }) {
  const { field, fieldState } = useController({ control, name: `content.adjuncts.${index}.preparation` });
  const [text, setText] = useState(() => (field.value as { text: string }[]).map((s) => s.text).join('\n'));
  return (
    <TextAreaField
      label="Preparation, one step per line"
      rows={6}
      value={text}
      disabled={disabled}
      onChange={(e) => {
        setText(e.target.value);
        field.onChange(
          e.target.value
            .split('\n')
            .map((t) => t.trim())
            .filter(Boolean)
            .map((t) => ({ text: t })),
        );
      }}
      onBlur={field.onBlur}
      error={fieldState.error?.message}
    />
  );
}

/** The batch volume as the rest of the app shows it (e.g. "= 10.0 bbl"), when that is not the field's own unit. */
function batchVolumeHint(system: UnitSystem, litres: number | undefined): string | undefined {
  if (typeof litres !== 'number' || !Number.isFinite(litres) || litres <= 0) return undefined;
  const shown = showVolume(system, litres);
  return shown.endsWith(` ${displayUnit('volume', system).unit}`) ? undefined : `= ${shown}`;
}

/** Four significant figures: enough for a dose restated in another unit, short enough to read. */
const sig4 = (x: number) => Number(x.toPrecision(4));

function Additions({
  control,
  register,
  errors,
  disabled,
  kind,
  amounts,
  sugar,
  setValue,
  volumeL,
}: Shared & { kind: 'adjuncts' | 'spices'; amounts: string[]; sugar: string[]; volumeL: number | undefined }) {
  const list = useFieldArray({ control, name: `content.${kind}` as 'content.spices' });
  const values = useWatch({ control, name: `content.${kind}` as 'content.spices' });
  const title = kind === 'adjuncts' ? 'Prepared adjuncts' : 'Spices';
  return (
    <Section title={title}>
      {list.fields.map((f, i) => {
        const p = `content.${kind}.${i}` as 'content.spices.0';
        const v = values[i];
        const unit = v?.rule ? doseUnitLabel(v.rule) : '';
        return (
          <Row
            key={f.id}
            legend={`${kind === 'adjuncts' ? 'Adjunct' : 'Spice'} ${i + 1}`}
            onRemove={() => list.remove(i)}
            disabled={disabled}
          >
            {w(
              'min-w-64 flex-1',
              <TextField
                label="Name"
                list={kind === 'adjuncts' ? 'kw-library-adjunct' : undefined}
                {...register(`${p}.name`)}
                error={errorAt(errors, `${p}.name`)}
                disabled={disabled}
              />,
            )}
            {w(
              'w-36',
              <SelectField label="Kind" {...register(`${p}.category`)} disabled={disabled}>
                {ADJUNCT_CATEGORIES.map((x) => (
                  <option key={x} value={x}>
                    {x}
                  </option>
                ))}
              </SelectField>,
            )}
            {w(
              'w-40',
              <SelectField
                label="Goes in"
                {...register(`${p}.stage`, {
                  // Only the boil counts minutes left: a minute kept from the boil would put fruit in the fermenter "at 15 min left".
                  onChange: (e: ChangeEvent<HTMLInputElement | HTMLSelectElement>) =>
                    e.target.value !== 'boil' && setValue(`${p}.boilMinutes`, undefined, { shouldValidate: true }),
                })}
                disabled={disabled}
              >
                {ADJUNCT_STAGES.map((x) => (
                  <option key={x} value={x}>
                    {STAGE_LABELS[x]}
                  </option>
                ))}
              </SelectField>,
            )}
            {v?.stage === 'boil' &&
              w(
                'w-28',
                // Controlled, so a minute cleared by leaving the boil stays cleared when the field comes back.
                <TextField
                  label="Minutes left"
                  type="number"
                  step="any"
                  value={typeof v.boilMinutes === 'number' && Number.isFinite(v.boilMinutes) ? v.boilMinutes : ''}
                  onChange={(e) =>
                    setValue(`${p}.boilMinutes`, asNumber(true).setValueAs(e.target.value), {
                      shouldValidate: true,
                      shouldDirty: true,
                    })
                  }
                  error={errorAt(errors, `${p}.boilMinutes`)}
                  disabled={disabled}
                />,
              )}
            <div className="flex w-full flex-wrap items-end gap-3">
              {w(
                'w-44',
                <SelectField
                  label="Dosed"
                  {...register(`${p}.rule.basis`, {
                    // Restate low, high and dose in the new unit so the same amount goes in; a weight cannot become a volume, so those stay as typed.
                    onChange: (e: ChangeEvent<HTMLInputElement | HTMLSelectElement>) => {
                      const before = v?.rule;
                      if (!before || v.level === undefined || !volumeL) return;
                      try {
                        const basis = DOSE_BASES.find((b) => b === e.target.value);
                        if (!basis) return;
                        const next = convertDoseRule(before, v.level, basis, volumeL);
                        if (!next) return;
                        setValue(
                          `${p}.rule`,
                          { ...next.rule, low: sig4(next.rule.low), high: sig4(next.rule.high) },
                          { shouldValidate: true },
                        );
                        setValue(`${p}.level`, sig4(next.level), { shouldValidate: true });
                      } catch {
                        // An unfinished rule (e.g. high below low) is left for its own field errors.
                      }
                    },
                  })}
                  disabled={disabled}
                >
                  {DOSE_BASES.map((x) => (
                    <option key={x} value={x}>
                      {doseBasisLabel(x)}
                    </option>
                  ))}
                </SelectField>,
              )}
              {(['low', 'high'] as const).map((end) =>
                w(
                  'w-36',
                  <TextField
                    key={end}
                    label={`${end === 'low' ? 'Low' : 'High'} (${unit})`}
                    type="number"
                    step="any"
                    {...register(`${p}.rule.${end}`, asNumber())}
                    error={errorAt(errors, `${p}.rule.${end}`)}
                    disabled={disabled}
                  />,
                ),
              )}
              {w(
                'w-36',
                <TextField
                  label={`Dose (${unit})`}
                  type="number"
                  step="any"
                  {...register(`${p}.level`, asNumber())}
                  error={errorAt(errors, `${p}.level`)}
                  disabled={disabled}
                />,
              )}
              <p
                className="min-h-touch pb-2 text-lg font-semibold tabular-nums"
                aria-label={`${title} ${i + 1} amount`}
              >
                {amounts[i] ?? ''}
              </p>
            </div>
            <div className="flex w-full flex-wrap items-end gap-3">
              {w(
                'w-36',
                <TextField
                  label="Sugar (% of weight)"
                  type="number"
                  step="any"
                  placeholder={v?.category ? String(TYPICAL_SUGAR_PCT[v.category].pct) : ''}
                  {...register(`${p}.sugarPct`, asNumber(true))}
                  error={errorAt(errors, `${p}.sugarPct`)}
                  disabled={disabled}
                />,
              )}
              <p className="min-h-touch flex-1 pb-2 text-sm text-ink-700" aria-label={`${title} ${i + 1} sugar`}>
                {sugar[i] ?? ''}
              </p>
            </div>
            {w(
              'w-full',
              <TextField
                label="How it goes in"
                {...register(`${p}.howAdded`)}
                error={errorAt(errors, `${p}.howAdded`)}
                disabled={disabled}
              />,
            )}
            {kind === 'adjuncts' && w('w-full', <PreparationSteps control={control} index={i} disabled={disabled} />)}
          </Row>
        );
      })}
      {!disabled && (
        <Button
          variant="secondary"
          onClick={() =>
            list.append({
              name: '',
              category: kind === 'adjuncts' ? 'fruit' : 'spice',
              stage: 'boil',
              boilMinutes: kind === 'adjuncts' ? 15 : 5,
              rule:
                kind === 'adjuncts'
                  ? { basis: 'lbPerUsGal', low: 0.25, high: 1 }
                  : { basis: 'tspPer5UsGal', low: 0.5, high: 2 },
              level: kind === 'adjuncts' ? 0.5 : 1,
              howAdded: '',
              ...(kind === 'adjuncts' ? { preparation: [] } : {}),
            } as never)
          }
        >
          {kind === 'adjuncts' ? 'Add an adjunct' : 'Add a spice'}
        </Button>
      )}
    </Section>
  );
}

export interface RecipeEditorProps {
  initial: FormIn;
  equipment: EquipmentRow[];
  /** The brewery's ingredient library, offered as names while typing. */
  library: IngredientRow[];
  system: UnitSystem;
  canEdit: boolean;
  /** Shown above the save buttons, e.g. that the version is frozen. */
  notice?: ReactNode;
  /** The label of the main save action ("Save version 2", "Save as version 3", "Create recipe"). */
  saveLabel: string;
  /** Offered when the version can also be saved in place. */
  saveAsNewLabel?: string;
  onSave: (
    values: CreateRecipeInput,
    asNew: boolean,
  ) => Promise<{ fieldErrors?: Record<string, string>; message?: string } | void>;
}

/** The recipe editor: every section as a form on the shared schema, numbers recomputed as you type. */
export function RecipeEditor({
  initial,
  equipment,
  library,
  system,
  canEdit,
  notice,
  saveLabel,
  saveAsNewLabel,
  onSave,
}: RecipeEditorProps) {
  const form = useForm<FormIn, unknown, CreateRecipeInput>({
    resolver: quantityResolver(createRecipeSchema, system),
    defaultValues: initial,
    mode: 'onChange',
  });
  const { control, register, handleSubmit, setValue, setError, formState } = form;
  const [banner, setBanner] = useState<string>();
  // Which of the two save buttons submitted: read at submit time, so a ref rather than state.
  const asNew = useRef(false);
  const values = useWatch({ control });
  const profile = equipment.find((e) => e.id === Number(values.equipmentProfileId));
  const live = useLiveNumbers(values.name ?? '', values.content, profile);
  const disabled = !canEdit;
  const fromLibrary = (kind: IngredientKind, name: string) => library.find((i) => i.kind === kind && i.name === name);
  const shared: Shared = { control, register, errors: formState.errors, system, disabled, fromLibrary, setValue };
  const c = live.computed;
  const adjunctCount = values.content?.adjuncts?.length ?? 0;
  const batchVolumeL = values.content?.targets?.batchVolumeL;
  const spiceCount = values.content?.spices?.length ?? 0;
  // What each addition's sugar does to the OG, or why it is not counted; blank when it has none.
  const sugarNote = (i: number) => {
    const a = live.adjunctAt(i);
    if (!a) return '';
    if (a.sugarNotCounted) return `Sugar not counted: ${a.sugarNotCounted}.`;
    return a.gravityPoints > 0
      ? `${a.sugarPct} % sugar adds ${a.gravityPoints.toFixed(1)} points to the OG`
      : a.sugarPct > 0
        ? ''
        : 'No sugar counted toward the OG';
  };
  const measured = (i: number) => {
    const a = live.adjunctAt(i);
    return a ? (a.amount.value > 0 ? showAdjunct(a, system) : '0') : '';
  };

  const submit = handleSubmit(
    async (v) => {
      setBanner(undefined);
      const result = await onSave(v, asNew.current);
      if (result?.fieldErrors)
        for (const [k, m] of Object.entries(result.fieldErrors)) setError(k as never, { type: 'server', message: m });
      if (result?.message) setBanner(result.message);
    },
    () => setBanner('Some fields need attention: they are marked in red.'),
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4 lg:flex-row lg:items-start">
      <div className="min-w-0 flex-1 space-y-4">
        {(['fermentable', 'hop', 'yeast', 'adjunct'] as const).map((kind) => (
          <datalist key={kind} id={`kw-library-${kind}`}>
            {library
              .filter((i) => i.kind === kind)
              .map((i) => (
                <option key={i.id} value={i.name} />
              ))}
          </datalist>
        ))}
        <Section title="Recipe">
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField
              label="Name"
              {...register('name')}
              error={errorAt(formState.errors, 'name')}
              disabled={disabled}
            />
            <TextField
              label="Style"
              {...register('style')}
              error={errorAt(formState.errors, 'style')}
              disabled={disabled}
            />
            <SelectField label="Status" {...register('status')} disabled={disabled}>
              {RECIPE_STATUSES.map((s) => (
                <option key={s} value={s}>
                  {s[0]!.toUpperCase() + s.slice(1)}
                </option>
              ))}
            </SelectField>
            <SelectField
              label="Written for"
              {...register('equipmentProfileId', {
                setValueAs: Number,
                onChange: (e: ChangeEvent<HTMLInputElement | HTMLSelectElement>) => {
                  const chosen = equipment.find((x) => x.id === Number(e.target.value));
                  if (chosen) setValue('content.targets.batchVolumeL', chosen.batchVolumeL, { shouldValidate: true });
                },
              })}
              error={errorAt(formState.errors, 'equipmentProfileId')}
              disabled={disabled}
            >
              {equipment.map((e) => (
                <option key={e.id} value={e.id}>
                  {e.name}
                </option>
              ))}
            </SelectField>
            <QuantityField
              control={control}
              name="content.targets.batchVolumeL"
              label="Batch into fermenter"
              quantity="volume"
              system={system}
              disabled={disabled}
              hint={batchVolumeHint(system, batchVolumeL)}
            />
          </div>
          <TextAreaField
            label="Description"
            rows={2}
            {...register('description')}
            error={errorAt(formState.errors, 'description')}
            disabled={disabled}
          />
        </Section>
        <Section title="Targets">
          <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
            <TextField
              label="OG"
              type="number"
              step="0.001"
              {...register('content.targets.og', asNumber())}
              error={errorAt(formState.errors, 'content.targets.og')}
              disabled={disabled}
            />
            <TextField
              label="FG"
              type="number"
              step="0.001"
              {...register('content.targets.fg', asNumber())}
              error={errorAt(formState.errors, 'content.targets.fg')}
              disabled={disabled}
            />
            <TextField
              label="IBU"
              type="number"
              step="any"
              {...register('content.targets.ibu', asNumber())}
              error={errorAt(formState.errors, 'content.targets.ibu')}
              disabled={disabled}
            />
            <TextField
              label="SRM"
              type="number"
              step="any"
              {...register('content.targets.srm', asNumber())}
              error={errorAt(formState.errors, 'content.targets.srm')}
              disabled={disabled}
            />
          </div>
        </Section>
        <GrainBill
          {...shared}
          ogNow={c?.og}
          weightsNow={c?.fermentables.map((f) => f.weightKg)}
          setBill={(bill) => setValue('content.grainBill', bill, { shouldValidate: true })}
        />
        <Hops
          {...shared}
          ibus={c?.hops.map((h) => h.ibu)}
          solvedWeights={c?.hops.map((h) => h.weightG)}
          targetIbu={values.content?.targets?.ibu}
        />
        <Mash {...shared} />
        <Water {...shared} setWater={(water) => setValue('content.water', water, { shouldValidate: true })} />
        <Additions
          {...shared}
          kind="adjuncts"
          volumeL={batchVolumeL}
          amounts={Array.from({ length: adjunctCount }, (_, i) => measured(i))}
          sugar={Array.from({ length: adjunctCount }, (_, i) => sugarNote(i))}
        />
        <Additions
          {...shared}
          kind="spices"
          volumeL={batchVolumeL}
          amounts={Array.from({ length: spiceCount }, (_, i) => measured(adjunctCount + i))}
          sugar={Array.from({ length: spiceCount }, (_, i) => sugarNote(adjunctCount + i))}
        />
        <Section title="Yeast">
          <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
            <div className="col-span-2">
              <TextField
                label="Yeast"
                list="kw-library-yeast"
                {...register('content.yeast.name', {
                  onChange: (e: ChangeEvent<HTMLInputElement | HTMLSelectElement>) => {
                    const hit = fromLibrary('yeast', e.target.value);
                    if (hit?.attenuationPct != null)
                      setValue('content.yeast.attenuationPct', hit.attenuationPct, { shouldValidate: true });
                  },
                })}
                error={errorAt(formState.errors, 'content.yeast.name')}
                disabled={disabled}
              />
            </div>
            <SelectField label="Strain type" {...register('content.yeast.strainType')} disabled={disabled}>
              {YEAST_TYPES.map((x) => (
                <option key={x} value={x}>
                  {x}
                </option>
              ))}
            </SelectField>
            <QuantityField
              control={control}
              name="content.yeast.pitchTempC"
              label="Pitch at"
              quantity="temperature"
              system={system}
              disabled={disabled}
            />
            <TextField
              label="Expected attenuation (%)"
              type="number"
              step="any"
              {...register('content.yeast.attenuationPct', asNumber())}
              error={errorAt(formState.errors, 'content.yeast.attenuationPct')}
              disabled={disabled}
            />
            <TextField
              label="Range low (%)"
              type="number"
              step="any"
              {...register('content.yeast.attenuationLowPct', asNumber())}
              error={errorAt(formState.errors, 'content.yeast.attenuationLowPct')}
              disabled={disabled}
            />
            <TextField
              label="Range high (%)"
              type="number"
              step="any"
              {...register('content.yeast.attenuationHighPct', asNumber())}
              error={errorAt(formState.errors, 'content.yeast.attenuationHighPct')}
              disabled={disabled}
            />
            <TextField
              label="Pitch rate (M cells/mL/°P)"
              type="number"
              step="any"
              {...register('content.yeast.pitchRateMillionCellsPerMlPerPlato', asNumber(true))}
              error={errorAt(formState.errors, 'content.yeast.pitchRateMillionCellsPerMlPerPlato')}
              disabled={disabled}
            />
          </div>
        </Section>
        <Section title="Fermentation">
          <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
            <QuantityField
              control={control}
              name="content.fermentation.primaryTempC"
              label="Primary"
              quantity="temperature"
              system={system}
              disabled={disabled}
            />
            <TextField
              label="D-rest when this many points above FG"
              type="number"
              step="any"
              {...register('content.fermentation.dRestPointsAboveFg', asNumber(true))}
              error={errorAt(formState.errors, 'content.fermentation.dRestPointsAboveFg')}
              disabled={disabled}
            />
            <QuantityField
              control={control}
              name="content.fermentation.dRestTempC"
              label="D-rest at"
              quantity="temperature"
              system={system}
              optional
              disabled={disabled}
            />
            <QuantityField
              control={control}
              name="content.fermentation.crashTempC"
              label="Crash to"
              quantity="temperature"
              system={system}
              disabled={disabled}
            />
            <TextField
              label="Target CO₂ (volumes)"
              type="number"
              step="0.1"
              {...register('content.fermentation.co2Volumes', asNumber())}
              error={errorAt(formState.errors, 'content.fermentation.co2Volumes')}
              disabled={disabled}
            />
          </div>
        </Section>
        <Section title="Notes">
          <TextAreaField
            label="Notes for the brewer"
            rows={3}
            {...register('content.notes')}
            error={errorAt(formState.errors, 'content.notes')}
            disabled={disabled}
          />
        </Section>
        <NumbersBar live={live} />
      </div>
      <aside className="space-y-3 lg:sticky lg:top-20 lg:w-80 lg:shrink-0">
        <Card id="live-numbers">
          <LiveNumbersPanel live={live} system={system} />
        </Card>
        {!canEdit && (
          <p className="rounded-lg bg-mist-100 p-3 text-sm text-ink-700">
            Read only: the head brewer edits recipes. The brew sheet is one tap away above.
          </p>
        )}
        {canEdit && (
          <Card className="space-y-3">
            {notice}
            <TextField
              label="What changed"
              {...register('changeNote')}
              error={errorAt(formState.errors, 'changeNote')}
            />
            <FormBanner message={banner} />
            <Button
              type="submit"
              size="lg"
              className={cx('w-full')}
              busy={formState.isSubmitting && !asNew.current}
              onClick={() => (asNew.current = false)}
            >
              {saveLabel}
            </Button>
            {saveAsNewLabel && (
              <Button
                type="submit"
                variant="secondary"
                className="w-full"
                busy={formState.isSubmitting && asNew.current}
                onClick={() => (asNew.current = true)}
              >
                {saveAsNewLabel}
              </Button>
            )}
          </Card>
        )}
      </aside>
    </form>
  );
}
