import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useNavigate, useParams } from 'react-router-dom';
import { acceptInviteSchema, type AcceptInviteInput } from '../../../../shared/schemas/auth';
import { ROLE_LABELS, type Role } from '../../../../shared/schemas/roles';
import { Button, ErrorState, Loading, TextField } from '../../../components/ui';
import { applyServerErrors } from '../../../lib/forms';
import { useAcceptInvite } from '../api/session';
import { useInvite } from '../api/links';
import { AuthFrame } from './auth-frame';
import { FormBanner } from '../../../components/ui/form-banner';
import { PasswordHint } from '../../../components/ui/password-hint';

export function AcceptInvitePage() {
  const { token = '' } = useParams();
  const invite = useInvite(token);
  const accept = useAcceptInvite(token);
  const navigate = useNavigate();
  const [banner, setBanner] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<AcceptInviteInput>({
    resolver: zodResolver(acceptInviteSchema),
  });

  const onSubmit = handleSubmit(async (values) => {
    setBanner(undefined);
    try {
      await accept.mutateAsync(values);
      void navigate('/', { replace: true });
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });

  return (
    <AuthFrame title="Join your team">
      {invite.isPending && <Loading label="Checking your invitation" />}
      {invite.isError && <ErrorState error={invite.error} />}
      {invite.data && (
        <form onSubmit={onSubmit} className="space-y-4" noValidate>
          <p className="text-ink-700">
            You are joining <strong>{invite.data.breweryName}</strong> as{' '}
            {ROLE_LABELS[invite.data.role as Role]?.toLowerCase() ?? invite.data.role}, signing in with{' '}
            <strong>{invite.data.email}</strong>.
          </p>
          <FormBanner message={banner} />
          <TextField
            label="Your name"
            autoComplete="name"
            {...register('displayName')}
            error={formState.errors.displayName?.message}
          />
          <TextField
            label="Choose a password"
            type="password"
            autoComplete="new-password"
            hint={<PasswordHint />}
            {...register('password')}
            error={formState.errors.password?.message}
          />
          <Button type="submit" size="lg" className="w-full" busy={accept.isPending}>
            Join
          </Button>
        </form>
      )}
    </AuthFrame>
  );
}
