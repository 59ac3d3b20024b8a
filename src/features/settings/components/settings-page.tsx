import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  brewerySettingsSchema,
  changePasswordSchema,
  type BrewerySettingsInput,
  type ChangePasswordInput,
  type Me,
} from '../../../../shared/schemas/auth';
import { Button, Card, PageHeader, SelectField, TextField, useToast } from '../../../components/ui';
import { applyServerErrors } from '../../../lib/forms';
import { useUpdateBrewery } from '../api/brewery';
import { useChangePassword } from '../api/change-password';
import { FormBanner } from '../../../components/ui/form-banner';
import { PasswordHint } from '../../../components/ui/password-hint';
import { TimeZoneOptions } from '../../../components/ui/time-zone-options';
import { useCurrentUser, useCan } from '../../../lib/current-user';

function BreweryForm({ me }: { me: Me }) {
  const update = useUpdateBrewery();
  const toast = useToast();
  const [banner, setBanner] = useState<string>();
  const canEdit = useCan('brewery.edit');
  const { register, handleSubmit, setError, formState } = useForm<BrewerySettingsInput>({
    resolver: zodResolver(brewerySettingsSchema),
    defaultValues: { name: me.brewery.name, unitSystem: me.brewery.unitSystem, timeZone: me.brewery.timeZone },
  });
  const onSubmit = handleSubmit(async (values) => {
    setBanner(undefined);
    try {
      await update.mutateAsync(values);
      toast('Brewery settings saved');
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });
  return (
    <Card>
      <h2 className="mb-4 text-xl font-bold">Brewery</h2>
      <form onSubmit={onSubmit} className="space-y-4" noValidate>
        <FormBanner message={banner} />
        <fieldset disabled={!canEdit} className="space-y-4">
          <TextField label="Name" {...register('name')} error={formState.errors.name?.message} />
          <div className="grid gap-4 sm:grid-cols-2">
            <SelectField label="Units" {...register('unitSystem')} error={formState.errors.unitSystem?.message}>
              <option value="us">US (gal, lb, oz, °F)</option>
              <option value="metric">Metric (L, kg, g, °C)</option>
            </SelectField>
            <SelectField label="Time zone" {...register('timeZone')} error={formState.errors.timeZone?.message}>
              <TimeZoneOptions />
            </SelectField>
          </div>
        </fieldset>
        {canEdit ? (
          <Button type="submit" busy={update.isPending}>
            Save brewery settings
          </Button>
        ) : (
          <p className="text-ink-500">Only a head brewer changes these.</p>
        )}
      </form>
    </Card>
  );
}

function PasswordForm() {
  const change = useChangePassword();
  const toast = useToast();
  const [banner, setBanner] = useState<string>();
  const { register, handleSubmit, setError, formState, reset } = useForm<ChangePasswordInput>({
    resolver: zodResolver(changePasswordSchema),
  });
  const onSubmit = handleSubmit(async (values) => {
    setBanner(undefined);
    try {
      await change.mutateAsync(values);
      reset();
      toast('Password changed; your other sessions are signed out');
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });
  return (
    <Card>
      <h2 className="mb-4 text-xl font-bold">Your password</h2>
      <form onSubmit={onSubmit} className="space-y-4" noValidate>
        <FormBanner message={banner} />
        <TextField
          label="Current password"
          type="password"
          autoComplete="current-password"
          {...register('currentPassword')}
          error={formState.errors.currentPassword?.message}
        />
        <TextField
          label="New password"
          type="password"
          autoComplete="new-password"
          hint={<PasswordHint />}
          {...register('newPassword')}
          error={formState.errors.newPassword?.message}
        />
        <Button type="submit" busy={change.isPending}>
          Change password
        </Button>
      </form>
    </Card>
  );
}

export function SettingsPage() {
  const me = useCurrentUser();
  return (
    <>
      <PageHeader title="Settings" subtitle={`Signed in as ${me.displayName} (${me.email})`} />
      <div className="grid gap-6 lg:grid-cols-2">
        <BreweryForm me={me} />
        <PasswordForm />
      </div>
    </>
  );
}
