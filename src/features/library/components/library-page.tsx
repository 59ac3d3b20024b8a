import { useState } from 'react';
import { useForm } from 'react-hook-form';
import {
  equipmentSchema,
  ingredientSchema,
  INGREDIENT_KINDS,
  type EquipmentInput,
  type IngredientInput,
} from '../../../../shared/schemas/recipes';
import {
  Button,
  Card,
  Dialog,
  ErrorState,
  Loading,
  PageHeader,
  SelectField,
  Table,
  Td,
  TextField,
  Th,
  TextAreaField,
  useToast,
} from '../../../components/ui';
import { useCurrentUser, useCan } from '../../../lib/current-user';
import { applyServerErrors } from '../../../lib/forms';
import { show, showVolume } from '../../../lib/units';
import { quantityResolver } from '../../../lib/quantity-resolver';
import { QuantityField, asNumber } from '../../../components/ui/quantity-field';
import { useEquipment, useRemoveEquipment, useSaveEquipment } from '../../../lib/equipment';
import { useIngredients, useRemoveIngredient, useSaveIngredient } from '../../../lib/ingredients';
import type { EquipmentRow, IngredientRow } from '../../../../shared/contract/recipes';
import { FormBanner } from '../../../components/ui/form-banner';
import { ConfirmButton } from '../../../components/confirm-button';

function EquipmentForm({ row, onDone }: { row?: EquipmentRow; onDone: () => void }) {
  const me = useCurrentUser();
  const system = me.brewery.unitSystem;
  const save = useSaveEquipment();
  const remove = useRemoveEquipment();
  const toast = useToast();
  const [banner, setBanner] = useState<string>();
  const { id: _id, ...initial } = row ?? {
    id: 0,
    name: '',
    batchVolumeL: 100,
    brewhouseEfficiency: 0.75,
    boilOffLPerHour: 10,
    boilMinutes: 60,
    mashTunDeadSpaceL: 5,
    kettleDeadSpaceL: 3,
    trubChillerLossL: 5,
    fermenterLossL: 5,
    grainAbsorptionLPerKg: 1,
    maxMashTunVolumeL: 200,
    maxKettleVolumeL: 200,
    mashThicknessLPerKg: 3,
  };
  const { control, register, handleSubmit, setError, formState } = useForm<EquipmentInput>({
    resolver: quantityResolver(equipmentSchema, system),
    defaultValues: initial,
  });
  const err = (k: keyof EquipmentInput) => formState.errors[k]?.message;
  const volume = (name: keyof EquipmentInput, label: string) => (
    <QuantityField control={control} name={name} label={label} quantity="volume" system={system} />
  );
  return (
    <form
      noValidate
      className="space-y-3"
      onSubmit={handleSubmit(async (input) => {
        try {
          await save.mutateAsync({ id: row?.id, input });
          toast('Equipment saved');
          onDone();
        } catch (error) {
          setBanner(applyServerErrors(error, setError));
        }
      })}
    >
      <FormBanner message={banner} />
      <TextField label="Name" {...register('name')} error={err('name')} />
      <div className="grid grid-cols-2 gap-3">
        {volume('batchVolumeL', 'Batch into fermenter')}
        <QuantityField
          control={control}
          name="brewhouseEfficiency"
          label="Brewhouse efficiency"
          quantity="fraction"
          system={system}
        />
        <QuantityField
          control={control}
          name="boilOffLPerHour"
          label="Boil-off"
          quantity="volumePerHour"
          system={system}
        />
        <TextField
          label="Boil time (min)"
          type="number"
          {...register('boilMinutes', asNumber())}
          error={err('boilMinutes')}
        />
        {volume('mashTunDeadSpaceL', 'Mash tun dead space')}
        {volume('kettleDeadSpaceL', 'Kettle dead space')}
        {volume('trubChillerLossL', 'Trub and chiller loss')}
        {volume('fermenterLossL', 'Fermenter loss')}
        <QuantityField
          control={control}
          name="grainAbsorptionLPerKg"
          label="Grain absorption"
          quantity="waterToGrain"
          system={system}
        />
        <QuantityField
          control={control}
          name="mashThicknessLPerKg"
          label="Mash thickness"
          quantity="waterToGrain"
          system={system}
        />
        {volume('maxMashTunVolumeL', 'Mash tun capacity')}
        {volume('maxKettleVolumeL', 'Kettle capacity')}
      </div>
      <div className="flex items-center gap-2">
        {row && (
          <ConfirmButton
            ask="Remove…"
            confirm={`Remove ${row.name}`}
            act={() => remove.mutateAsync(row.id)}
            onDone={onDone}
            onRefused={(error) => setBanner(applyServerErrors(error, setError))}
          />
        )}
        <Button variant="quiet" className="ml-auto" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" busy={save.isPending}>
          Save equipment
        </Button>
      </div>
    </form>
  );
}

const blankIngredient: IngredientInput = { kind: 'fermentable', name: '', notes: '' };

function IngredientForm({ row, onDone }: { row?: IngredientRow; onDone: () => void }) {
  const system = useCurrentUser().brewery.unitSystem;
  const save = useSaveIngredient();
  const remove = useRemoveIngredient();
  const [banner, setBanner] = useState<string>();
  const initial: IngredientInput = row
    ? {
        kind: row.kind,
        name: row.name,
        notes: row.notes,
        ...(row.ppg !== null ? { ppg: row.ppg } : {}),
        ...(row.colourLovibond !== null ? { colourLovibond: row.colourLovibond } : {}),
        ...(row.alphaAcidPct !== null ? { alphaAcidPct: row.alphaAcidPct } : {}),
        ...(row.attenuationPct !== null ? { attenuationPct: row.attenuationPct } : {}),
      }
    : blankIngredient;
  const { register, handleSubmit, setError, formState, watch } = useForm<IngredientInput>({
    resolver: quantityResolver(ingredientSchema, system),
    defaultValues: initial,
  });
  const kind = watch('kind');
  return (
    <form
      noValidate
      className="space-y-3"
      onSubmit={handleSubmit(async (input) => {
        try {
          await save.mutateAsync({ id: row?.id, input });
          onDone();
        } catch (error) {
          setBanner(applyServerErrors(error, setError));
        }
      })}
    >
      <FormBanner message={banner} />
      <div className="grid grid-cols-2 gap-3">
        <SelectField label="Kind" {...register('kind')}>
          {INGREDIENT_KINDS.map((k) => (
            <option key={k} value={k}>
              {k}
            </option>
          ))}
        </SelectField>
        <TextField label="Name" {...register('name')} error={formState.errors.name?.message} />
        {kind === 'fermentable' && (
          <TextField
            label="Potential (ppg)"
            type="number"
            step="any"
            {...register('ppg', asNumber(true))}
            error={formState.errors.ppg?.message}
          />
        )}
        {kind === 'fermentable' && (
          <TextField
            label="Colour (°L)"
            type="number"
            step="any"
            {...register('colourLovibond', asNumber(true))}
            error={formState.errors.colourLovibond?.message}
          />
        )}
        {kind === 'hop' && (
          <TextField
            label="Alpha acid (%)"
            type="number"
            step="any"
            {...register('alphaAcidPct', asNumber(true))}
            error={formState.errors.alphaAcidPct?.message}
          />
        )}
        {kind === 'yeast' && (
          <TextField
            label="Attenuation (%)"
            type="number"
            step="any"
            {...register('attenuationPct', asNumber(true))}
            error={formState.errors.attenuationPct?.message}
          />
        )}
      </div>
      <TextAreaField label="Notes" rows={2} {...register('notes')} error={formState.errors.notes?.message} />
      <div className="flex items-center gap-2">
        {row && (
          <ConfirmButton
            ask="Remove…"
            confirm={`Remove ${row.name}`}
            act={() => remove.mutateAsync(row.id)}
            onDone={onDone}
            onRefused={(error) => setBanner(applyServerErrors(error, setError))}
          />
        )}
        <Button variant="quiet" className="ml-auto" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" busy={save.isPending}>
          Save ingredient
        </Button>
      </div>
    </form>
  );
}

/** Equipment profiles and the ingredient library: read by the brewing team, edited by the head brewer. */
export function LibraryPage() {
  const me = useCurrentUser();
  const canEditEquipment = useCan('equipment.edit');
  const canEditIngredients = useCan('ingredient.edit');
  const system = me.brewery.unitSystem;
  const equipment = useEquipment();
  const ingredients = useIngredients();
  const [editingEquipment, setEditingEquipment] = useState<EquipmentRow | 'new' | null>(null);
  const [editingIngredient, setEditingIngredient] = useState<IngredientRow | 'new' | null>(null);
  return (
    <>
      <PageHeader
        title="Brewhouse and ingredients"
        subtitle="The equipment recipes are written for, and the ingredients they are made from."
      />
      <Card className="mb-6 space-y-3">
        <div className="flex items-center justify-between">
          <h2 className="text-xl font-bold">Equipment profiles</h2>
          {canEditEquipment && (
            <Button variant="secondary" onClick={() => setEditingEquipment('new')}>
              Add equipment
            </Button>
          )}
        </div>
        {equipment.isPending ? (
          <Loading />
        ) : equipment.isError ? (
          <ErrorState error={equipment.error} onRetry={() => equipment.refetch()} />
        ) : (
          <Table>
            <thead>
              <tr>
                <Th>Name</Th>
                <Th>Batch</Th>
                <Th>Efficiency</Th>
                <Th>Boil-off</Th>
                <Th>Losses (tun / kettle / trub)</Th>
                <Th>Mash tun / kettle</Th>
                {canEditEquipment && (
                  <Th>
                    <span className="sr-only">Edit</span>
                  </Th>
                )}
              </tr>
            </thead>
            <tbody>
              {equipment.data.map((e) => (
                <tr key={e.id}>
                  <Td className="font-semibold">{e.name}</Td>
                  <Td className="whitespace-nowrap">{showVolume(system, e.batchVolumeL)}</Td>
                  <Td className="whitespace-nowrap">{(e.brewhouseEfficiency * 100).toFixed(0)} %</Td>
                  <Td className="whitespace-nowrap">{show(system, 'volumePerHour', e.boilOffLPerHour)}</Td>
                  <Td>
                    {[e.mashTunDeadSpaceL, e.kettleDeadSpaceL, e.trubChillerLossL].map((l, i) => (
                      <span key={i} className="mr-2 inline-block whitespace-nowrap">
                        {show(system, 'volume', l)}
                      </span>
                    ))}
                  </Td>
                  <Td className="whitespace-nowrap">
                    {showVolume(system, e.maxMashTunVolumeL)} / {showVolume(system, e.maxKettleVolumeL)}
                  </Td>
                  {canEditEquipment && (
                    <Td>
                      <Button variant="quiet" onClick={() => setEditingEquipment(e)}>
                        Edit
                      </Button>
                    </Td>
                  )}
                </tr>
              ))}
            </tbody>
          </Table>
        )}
      </Card>
      <Card className="space-y-3">
        <div className="flex items-center justify-between">
          <h2 className="text-xl font-bold">Ingredient library</h2>
          {canEditIngredients && (
            <Button variant="secondary" onClick={() => setEditingIngredient('new')}>
              Add ingredient
            </Button>
          )}
        </div>
        <p className="text-sm text-ink-500">
          Entries marked “typical” carry typical values for the kind of ingredient, not a supplier's analysis: check
          your lot's sheet.
        </p>
        {ingredients.isPending ? (
          <Loading />
        ) : ingredients.isError ? (
          <ErrorState error={ingredients.error} onRetry={() => ingredients.refetch()} />
        ) : (
          <Table>
            <thead>
              <tr>
                <Th>Kind</Th>
                <Th>Name</Th>
                <Th>Values</Th>
                <Th>Notes</Th>
                {canEditIngredients && (
                  <Th>
                    <span className="sr-only">Edit</span>
                  </Th>
                )}
              </tr>
            </thead>
            <tbody>
              {ingredients.data.map((i) => (
                <tr key={i.id}>
                  <Td>{i.kind}</Td>
                  <Td className="font-semibold">
                    {i.name}
                    {i.typical && (
                      <span className="ml-2 rounded-full bg-mist-200 px-2 text-xs font-semibold text-ink-700">
                        typical
                      </span>
                    )}
                  </Td>
                  <Td>
                    {[
                      i.ppg !== null && `${i.ppg} ppg`,
                      i.colourLovibond !== null && `${i.colourLovibond} °L`,
                      i.alphaAcidPct !== null && `${i.alphaAcidPct} % AA`,
                      i.attenuationPct !== null && `${i.attenuationPct} % att.`,
                    ]
                      .filter(Boolean)
                      .join(', ')}
                  </Td>
                  <Td>{i.notes}</Td>
                  {canEditIngredients && (
                    <Td>
                      <Button variant="quiet" onClick={() => setEditingIngredient(i)}>
                        Edit
                      </Button>
                    </Td>
                  )}
                </tr>
              ))}
            </tbody>
          </Table>
        )}
      </Card>
      <Dialog
        open={editingEquipment !== null}
        onClose={() => setEditingEquipment(null)}
        title={editingEquipment === 'new' ? 'Add equipment' : 'Edit equipment'}
      >
        {editingEquipment !== null && (
          <EquipmentForm
            key={editingEquipment === 'new' ? 'new' : editingEquipment.id}
            row={editingEquipment === 'new' ? undefined : editingEquipment}
            onDone={() => setEditingEquipment(null)}
          />
        )}
      </Dialog>
      <Dialog
        open={editingIngredient !== null}
        onClose={() => setEditingIngredient(null)}
        title={editingIngredient === 'new' ? 'Add ingredient' : 'Edit ingredient'}
      >
        {editingIngredient !== null && (
          <IngredientForm
            key={editingIngredient === 'new' ? 'new' : editingIngredient.id}
            row={editingIngredient === 'new' ? undefined : editingIngredient}
            onDone={() => setEditingIngredient(null)}
          />
        )}
      </Dialog>
    </>
  );
}
