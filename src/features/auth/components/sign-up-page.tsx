import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate } from 'react-router-dom';
import { signUpSchema, type SignUpInput } from '../../../../shared/schemas/auth';
import { Button, SelectField, TextField } from '../../../components/ui';
import { applyServerErrors } from '../../../lib/forms';
import { useSignUp } from '../api/session';
import { AuthFrame } from './auth-frame';
import { FormBanner } from '../../../components/ui/form-banner';
import { TimeZoneOptions } from '../../../components/ui/time-zone-options';
import { PasswordHint } from '../../../components/ui/password-hint';

export function SignUpPage() {
  const navigate = useNavigate();
  const signUp = useSignUp();
  const [banner, setBanner] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { unitSystem: 'us', timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone },
  });
  const e = formState.errors;

  const onSubmit = handleSubmit(async (values) => {
    setBanner(undefined);
    try {
      await signUp.mutateAsync(values);
      void navigate('/', { replace: true });
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });

  return (
    <AuthFrame title="Set up your brewery">
      <form onSubmit={onSubmit} className="space-y-4" noValidate>
        <FormBanner message={banner} />
        <TextField label="Brewery name" {...register('breweryName')} error={e.breweryName?.message} />
        <TextField label="Your name" autoComplete="name" {...register('displayName')} error={e.displayName?.message} />
        <TextField label="E-mail" type="email" autoComplete="email" {...register('email')} error={e.email?.message} />
        <TextField
          label="Password"
          type="password"
          autoComplete="new-password"
          hint={<PasswordHint />}
          {...register('password')}
          error={e.password?.message}
        />
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField label="Units" {...register('unitSystem')} error={e.unitSystem?.message}>
            <option value="us">US (gal, lb, oz, °F)</option>
            <option value="metric">Metric (L, kg, g, °C)</option>
          </SelectField>
          <SelectField label="Time zone" {...register('timeZone')} error={e.timeZone?.message}>
            <TimeZoneOptions />
          </SelectField>
        </div>
        <p className="text-sm text-ink-500">You become the brewery's head brewer and can invite your team.</p>
        <Button type="submit" size="lg" className="w-full" busy={signUp.isPending}>
          Create brewery
        </Button>
      </form>
      <p className="mt-6 text-cellar-700">
        Already on Kettlewright?{' '}
        <Link className="underline" to="/sign-in">
          Sign in
        </Link>
      </p>
    </AuthFrame>
  );
}
