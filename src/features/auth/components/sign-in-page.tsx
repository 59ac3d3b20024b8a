import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { signInSchema, type SignInInput } from '../../../../shared/schemas/auth';
import { Button, TextField } from '../../../components/ui';
import { applyServerErrors } from '../../../lib/forms';
import { useSignIn } from '../api/session';
import { AuthFrame } from './auth-frame';
import { FormBanner } from '../../../components/ui/form-banner';

export function SignInPage() {
  const navigate = useNavigate();
  const location = useLocation();
  const signIn = useSignIn();
  const [banner, setBanner] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });
  const from = (location.state as { from?: string } | null)?.from ?? '/';

  const onSubmit = handleSubmit(async (values) => {
    setBanner(undefined);
    try {
      await signIn.mutateAsync(values);
      void navigate(from, { replace: true });
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });

  return (
    <AuthFrame title="Sign in">
      <form onSubmit={onSubmit} className="space-y-4" noValidate>
        <FormBanner message={banner} />
        <TextField
          label="E-mail"
          type="email"
          autoComplete="username"
          {...register('email')}
          error={formState.errors.email?.message}
        />
        <TextField
          label="Password"
          type="password"
          autoComplete="current-password"
          {...register('password')}
          error={formState.errors.password?.message}
        />
        <Button type="submit" size="lg" className="w-full" busy={signIn.isPending}>
          Sign in
        </Button>
      </form>
      <div className="mt-6 flex flex-wrap justify-between gap-2 text-cellar-700">
        <Link className="underline" to="/forgot-password">
          Forgot your password?
        </Link>
        <Link className="underline" to="/sign-up">
          Set up a new brewery
        </Link>
      </div>
    </AuthFrame>
  );
}
