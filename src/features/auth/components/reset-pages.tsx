import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useParams } from 'react-router-dom';
import {
  resetPasswordSchema,
  resetRequestSchema,
  type ResetPasswordInput,
  type ResetRequestInput,
} from '../../../../shared/schemas/auth';
import { Button, Loading, TextField } from '../../../components/ui';
import { ApiError } from '../../../lib/api-client';
import { applyServerErrors } from '../../../lib/forms';
import { useRequestReset, useResetLink, useResetPassword } from '../api/links';
import { AuthFrame } from './auth-frame';
import { FormBanner } from '../../../components/ui/form-banner';
import { PasswordHint } from '../../../components/ui/password-hint';

export function ForgotPasswordPage() {
  const request = useRequestReset();
  const [banner, setBanner] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<ResetRequestInput>({
    resolver: zodResolver(resetRequestSchema),
  });
  const onSubmit = handleSubmit(async (values) => {
    try {
      await request.mutateAsync(values);
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });
  return (
    <AuthFrame title="Reset your password">
      {request.isSuccess ? (
        <p role="status" className="text-lg">
          {request.data.message} Check your inbox.
        </p>
      ) : (
        <form onSubmit={onSubmit} className="space-y-4" noValidate>
          <FormBanner message={banner} />
          <TextField
            label="E-mail"
            type="email"
            autoComplete="username"
            {...register('email')}
            error={formState.errors.email?.message}
          />
          <Button type="submit" size="lg" className="w-full" busy={request.isPending}>
            Send a reset link
          </Button>
        </form>
      )}
      <Link className="mt-6 inline-block text-cellar-700 underline" to="/sign-in">
        Back to sign-in
      </Link>
    </AuthFrame>
  );
}

/**
 * Why a reset link cannot be used: the server's reason when it gave one. Nothing else is quoted, since an error
 * from elsewhere could repeat the address, and the link's secret is in it.
 */
function linkProblem(error: unknown): string {
  if (error instanceof ApiError && error.status === 400)
    return 'This reset link is not complete: open it from the e-mail again, or ask for a new one.';
  if (error instanceof ApiError) return error.message;
  return 'This link could not be checked. Check the network, then open the link from the e-mail again.';
}

export function ResetPasswordPage() {
  const { token = '' } = useParams();
  const link = useResetLink(token);
  const reset = useResetPassword(token);
  const [banner, setBanner] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<ResetPasswordInput>({
    resolver: zodResolver(resetPasswordSchema),
  });
  const onSubmit = handleSubmit(async (values) => {
    try {
      await reset.mutateAsync(values);
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });
  return (
    <AuthFrame title="Choose a new password">
      {reset.isSuccess ? (
        <p role="status" className="text-lg">
          Your password is changed and your other sessions are signed out.{' '}
          <Link className="underline" to="/sign-in">
            Sign in
          </Link>
        </p>
      ) : link.isPending ? (
        <Loading label="Checking the link" />
      ) : link.isError ? (
        <div className="space-y-4">
          <p
            role="alert"
            className="rounded-xl border-2 border-ember-600 bg-ember-100 p-5 font-semibold text-ember-700"
          >
            {linkProblem(link.error)}
          </p>
          <Link className="underline" to="/forgot-password">
            Ask for a new link
          </Link>
        </div>
      ) : (
        <form onSubmit={onSubmit} className="space-y-4" noValidate>
          <FormBanner message={banner} />
          <TextField
            label="New password"
            type="password"
            autoComplete="new-password"
            hint={<PasswordHint />}
            {...register('password')}
            error={formState.errors.password?.message}
          />
          <Button type="submit" size="lg" className="w-full" busy={reset.isPending}>
            Save the new password
          </Button>
        </form>
      )}
    </AuthFrame>
  );
}
