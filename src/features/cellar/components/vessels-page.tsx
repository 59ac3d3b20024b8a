import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Dialog, EmptyState, ErrorState, LinkButton, Loading, PageHeader, SelectField, Table, Td, TextField, Th, useToast } from '../../../components/ui';
import { kpaToPsi, lToUsBbl } from '../../../../shared/brewing';
import { VESSEL_STATUS_LABELS, VESSEL_TYPE_LABELS, vesselInputSchema, type VesselInput, type VesselView } from '../../../../shared/schemas/cellar';
import { useCurrentUser } from '../../../app/current-user';
import { applyServerErrors } from '../../../lib/forms';
import { showVolume } from '../../../lib/units';
import { useSaveVessel, useVessels } from '../api/vessels';
import { useDeleteVessel, useMarkClean } from '../api/vessel-state';
import { FormBanner } from '../../../components/ui/form-banner';
import { useSubmitOnce } from './submit-once';

function VesselForm({ vessel, onDone }: { vessel?: VesselView; onDone: () => void }) {
  const me = useCurrentUser();
  const us = me.brewery.unitSystem === 'us';
  const save = useSaveVessel();
  const toast = useToast();
  const [banner, setBanner] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<VesselInput>({
    resolver: zodResolver(vesselInputSchema),
    defaultValues: {
      name: vessel?.name ?? '',
      type: vessel?.type ?? 'fermenter',
      capacity: vessel ? Number((us ? lToUsBbl(vessel.capacityL) : vessel.capacityL).toFixed(2)) : undefined,
      capacityUnit: us ? 'bbl' : 'l',
      ratedPressure: vessel ? Number((us ? kpaToPsi(vessel.ratedPressureKpa) : vessel.ratedPressureKpa).toFixed(1)) : undefined,
      pressureUnit: us ? 'psi' : 'kpa',
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
        <TextField label="Capacity" inputMode="decimal" {...register('capacity', { valueAsNumber: true })} error={e.capacity?.message} />
        <SelectField label="Unit" {...register('capacityUnit')}>
          <option value="bbl">bbl</option>
          <option value="l">L</option>
        </SelectField>
        <TextField label="Rated working pressure (gauge)" hint="From the vessel's nameplate." inputMode="decimal" {...register('ratedPressure', { valueAsNumber: true })} error={e.ratedPressure?.message} />
        <SelectField label="Unit" {...register('pressureUnit')}>
          <option value="psi">psi</option>
          <option value="kpa">kPa</option>
        </SelectField>
      </div>
      <div className="flex gap-2">
        <Button type="submit" busy={save.isPending}>{vessel ? 'Save vessel' : 'Add vessel'}</Button>
        <Button variant="quiet" onClick={onDone}>Cancel</Button>
      </div>
    </form>
  );
}

/** Fermenters and bright tanks: add, edit, mark clean, remove. */
export function VesselsPage() {
  const me = useCurrentUser();
  const { data, error, isPending, refetch } = useVessels();
  const clean = useMarkClean();
  const remove = useDeleteVessel();
  const toast = useToast();
  const [editing, setEditing] = useState<VesselView | 'new' | null>(null);
  const { once, busy } = useSubmitOnce();
  const isHead = me.role === 'head_brewer';
  const us = me.brewery.unitSystem === 'us';
  if (isPending) return <Loading label="Loading vessels" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  const act = (p: Promise<unknown>, done: string) => p.then(() => toast(done), (err: Error) => toast(err.message));
  return (
    <div>
      <PageHeader
        title="Vessels"
        subtitle="Fermenters and bright tanks, with the pressure each is rated for."
        actions={
          <div className="flex gap-2">
            <LinkButton to="/cellar/vessels/labels">Print labels</LinkButton>
            {isHead && <Button onClick={() => setEditing('new')}>Add a vessel</Button>}
          </div>
        }
      />
      {data.length === 0 ? (
        <EmptyState title="No vessels yet" />
      ) : (
        <Table>
          <thead>
            <tr><Th>Name</Th><Th>Type</Th><Th>Capacity</Th><Th>Rated pressure</Th><Th>State</Th><Th><span className="sr-only">Actions</span></Th></tr>
          </thead>
          <tbody>
            {data.map((v) => (
              <tr key={v.id}>
                <Td className="font-semibold">{v.name}</Td>
                <Td>{VESSEL_TYPE_LABELS[v.type]}</Td>
                <Td>{showVolume(me.brewery.unitSystem, v.capacityL)}</Td>
                <Td>{us ? `${kpaToPsi(v.ratedPressureKpa).toFixed(0)} psi` : `${v.ratedPressureKpa.toFixed(0)} kPa`}</Td>
                <Td>{VESSEL_STATUS_LABELS[v.status]}</Td>
                <Td className="space-x-2 whitespace-nowrap text-right">
                  {v.status === 'needs_cleaning' && <Button variant="secondary" busy={busy && clean.variables === v.id} onClick={once(() => act(clean.mutateAsync(v.id), `${v.name} marked clean`))}>Mark clean</Button>}
                  {isHead && <Button variant="quiet" onClick={() => setEditing(v)}>Edit</Button>}
                  {isHead && v.currentBatchId === null && (
                    <Button variant="quiet" onClick={() => window.confirm(`Remove ${v.name}?`) && act(remove.mutateAsync(v.id), `${v.name} removed`)}>Remove</Button>
                  )}
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      )}
      <Dialog open={editing !== null} onClose={() => setEditing(null)} title={editing === 'new' ? 'Add a vessel' : `Edit ${editing?.name ?? ''}`}>
        {editing !== null && <VesselForm key={editing === 'new' ? 'new' : editing.id} vessel={editing === 'new' ? undefined : editing} onDone={() => setEditing(null)} />}
      </Dialog>
    </div>
  );
}
