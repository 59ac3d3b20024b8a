import { useState } from 'react';
import { useForm } from 'react-hook-form';
import {
  Button,
  Caution,
  Dialog,
  EmptyState,
  ErrorState,
  LinkButton,
  Loading,
  PageHeader,
  SelectField,
  Table,
  Td,
  TextField,
  Th,
  useToast,
} from '../../../components/ui';
import { QUANTITIES, unitBySymbol } from '../../../../shared/quantities';
import { QuantityField } from '../../../components/ui/quantity-field';
import { quantityResolver } from '../../../lib/quantity-resolver';
import { vesselInputSchema, type VesselInput, type VesselView } from '../../../../shared/schemas/cellar';
import { VESSEL_STATUS_LABELS, VESSEL_TYPE_LABELS } from '../labels';
import { useCurrentUser, useCan } from '../../../lib/current-user';
import { applyServerErrors } from '../../../lib/forms';
import { show, showVolume } from '../../../lib/units';
import { useSaveVessel, useVessels } from '../../../lib/vessels';
import { useDeleteVessel, useMarkClean } from '../api/vessel-state';
import { FormBanner } from '../../../components/ui/form-banner';
import { useSubmitOnce } from '../../../lib/use-submit-once';

function VesselForm({ vessel, onDone }: { vessel?: VesselView; onDone: () => void }) {
  const system = useCurrentUser().brewery.unitSystem;
  const save = useSaveVessel();
  const toast = useToast();
  const [banner, setBanner] = useState<string>();
  // A pilot fermenter is sized in gallons (or litres), a production tank in barrels (or hectolitres).
  const volumeUnits = QUANTITIES.volume.units[system];
  const [capacityUnit, setCapacityUnit] = useState(
    () => volumeUnits[vessel && vessel.capacityL >= 200 ? 1 : 0] ?? volumeUnits[0],
  );
  const { control, register, handleSubmit, setError, formState, getValues, setValue } = useForm<VesselInput>({
    resolver: quantityResolver(vesselInputSchema, system),
    defaultValues: {
      name: vessel?.name ?? '',
      type: vessel?.type ?? 'fermenter',
      capacityL: vessel?.capacityL,
      ratedPressureKpa: vessel?.ratedPressureKpa,
    },
  });
  const e = formState.errors;
  const onSubmit = handleSubmit(async (input) => {
    setBanner(undefined);
    try {
      await save.mutateAsync({ id: vessel?.id, input });
      toast(vessel ? 'Vessel saved' : 'Vessel added');
      onDone();
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3">
      <FormBanner message={banner} />
      <TextField label="Name" {...register('name')} error={e.name?.message} />
      <SelectField label="Type" {...register('type')} error={e.type?.message}>
        <option value="fermenter">Fermenter</option>
        <option value="bright_tank">Bright tank</option>
      </SelectField>
      <div className="grid grid-cols-[1fr_6rem] gap-3">
        <QuantityField
          control={control}
          name="capacityL"
          label="Capacity"
          quantity="volume"
          system={system}
          unit={capacityUnit}
        />
        <SelectField
          label="Unit"
          value={capacityUnit.unit}
          onChange={(event) => {
            // The number typed stays as typed and now means the chosen unit: "7" then "bbl" is 7 bbl, not 0.2 bbl.
            const next = unitBySymbol('volume', system, event.target.value);
            const litres = getValues('capacityL');
            if (Number.isFinite(litres)) setValue('capacityL', next.toSi(capacityUnit.fromSi(litres)));
            setCapacityUnit(next);
          }}
        >
          {volumeUnits.map((u) => (
            <option key={u.unit} value={u.unit}>
              {u.unit}
            </option>
          ))}
        </SelectField>
      </div>
      <QuantityField
        control={control}
        name="ratedPressureKpa"
        label="Rated working pressure (gauge)"
        hint="From the vessel's nameplate; 0 for a vessel that holds no pressure."
        quantity="pressure"
        system={system}
      />
      <div className="flex gap-2">
        <Button type="submit" busy={save.isPending}>
          {vessel ? 'Save vessel' : 'Add vessel'}
        </Button>
        <Button variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** The cautions for cleaning a tank with caustic or acid, shown where the cleaning is recorded. */
function CleaningCaution() {
  return (
    <Caution title="Caustic and acid cleaners">
      <ul className="list-disc space-y-1 pl-5">
        <li>Wear eye and face protection, chemical-resistant gloves and sleeves.</li>
        <li>Add concentrated chemical to water, never water to the concentrate: it can boil and spatter.</li>
        <li>
          Vent and purge CO₂ from a closed tank before caustic goes in: caustic absorbs CO₂, and the vacuum can collapse
          the tank. Keep the tank open to air while it is cleaned.
        </li>
        <li>Never mix caustic and acid, or either with chlorine-based sanitiser.</li>
      </ul>
      <p className="mt-2">
        Follow your chemical supplier&apos;s safety data sheet, your local rules and licensed practice.
      </p>
    </Caution>
  );
}

/** Records that an emptied vessel was cleaned, with the cleaning cautions in front of the person doing it. */
function CleanVessel({ vessel, onDone }: { vessel: VesselView; onDone: () => void }) {
  const clean = useMarkClean();
  const toast = useToast();
  const { once, busy } = useSubmitOnce();
  return (
    <div className="space-y-4">
      <CleaningCaution />
      <p>Record {vessel.name} as cleaned and ready for the next batch.</p>
      <div className="flex gap-2">
        <Button
          busy={busy}
          onClick={once(async () => {
            try {
              await clean.mutateAsync(vessel.id);
              toast(`${vessel.name} marked clean`);
              onDone();
            } catch (err) {
              toast((err as Error).message);
            }
          })}
        >
          {vessel.name} is clean
        </Button>
        <Button variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </div>
  );
}

/** Fermenters and bright tanks: add, edit, mark clean, remove. */
export function VesselsPage() {
  const me = useCurrentUser();
  const mayEdit = useCan('vessel.edit');
  const { data, error, isPending, refetch } = useVessels();
  const [cleaning, setCleaning] = useState<VesselView | null>(null);
  const remove = useDeleteVessel();
  const toast = useToast();
  const [editing, setEditing] = useState<VesselView | 'new' | null>(null);
  if (isPending) return <Loading label="Loading vessels" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  const act = (p: Promise<unknown>, done: string) =>
    p.then(
      () => toast(done),
      (err: Error) => toast(err.message),
    );
  return (
    <div>
      <PageHeader
        title="Vessels"
        subtitle="Fermenters and bright tanks, with the pressure each is rated for."
        actions={
          <div className="flex gap-2">
            <LinkButton to="/cellar/vessels/labels">Print labels</LinkButton>
            {mayEdit && <Button onClick={() => setEditing('new')}>Add a vessel</Button>}
          </div>
        }
      />
      {data.length === 0 ? (
        <EmptyState title="No vessels yet" />
      ) : (
        <Table>
          <thead>
            <tr>
              <Th>Name</Th>
              <Th>Type</Th>
              <Th>Capacity</Th>
              <Th>Rated pressure</Th>
              <Th>State</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          </thead>
          <tbody>
            {data.map((v) => (
              <tr key={v.id}>
                <Td className="font-semibold">{v.name}</Td>
                <Td>{VESSEL_TYPE_LABELS[v.type]}</Td>
                <Td>{showVolume(me.brewery.unitSystem, v.capacityL)}</Td>
                <Td>{show(me.brewery.unitSystem, 'pressure', v.ratedPressureKpa, 0)}</Td>
                <Td>{VESSEL_STATUS_LABELS[v.status]}</Td>
                <Td className="space-x-2 whitespace-nowrap text-right">
                  {v.status === 'needs_cleaning' && (
                    <Button variant="secondary" onClick={() => setCleaning(v)}>
                      Mark clean
                    </Button>
                  )}
                  {mayEdit && (
                    <Button variant="quiet" onClick={() => setEditing(v)}>
                      Edit
                    </Button>
                  )}
                  {mayEdit && v.currentBatchId === null && (
                    <Button
                      variant="quiet"
                      onClick={() =>
                        window.confirm(`Remove ${v.name}?`) && act(remove.mutateAsync(v.id), `${v.name} removed`)
                      }
                    >
                      Remove
                    </Button>
                  )}
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      )}
      <Dialog
        open={editing !== null}
        onClose={() => setEditing(null)}
        title={editing === 'new' ? 'Add a vessel' : `Edit ${editing?.name ?? ''}`}
      >
        {editing !== null && (
          <VesselForm
            key={editing === 'new' ? 'new' : editing.id}
            vessel={editing === 'new' ? undefined : editing}
            onDone={() => setEditing(null)}
          />
        )}
      </Dialog>
      <Dialog open={cleaning !== null} onClose={() => setCleaning(null)} title={`Clean ${cleaning?.name ?? ''}`}>
        {cleaning !== null && <CleanVessel key={cleaning.id} vessel={cleaning} onDone={() => setCleaning(null)} />}
      </Dialog>
    </div>
  );
}
