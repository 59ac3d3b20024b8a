import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { inviteSchema, type InviteInput } from '../../../../shared/schemas/auth';
import { ROLES, ROLE_LABELS, type Role } from '../../../../shared/schemas/roles';
import {
  Button,
  Card,
  ErrorState,
  Loading,
  PageHeader,
  SelectField,
  Table,
  Td,
  TextField,
  Th,
  useToast,
} from '../../../components/ui';
import { applyServerErrors } from '../../../lib/forms';
import { useInviteTeammate, useTeam, useUpdateMember } from '../api/team';
import type { Team } from '../../../../shared/contract/auth';
import { FormBanner } from '../../../components/ui/form-banner';
import { ConfirmButton } from '../../../components/confirm-button';
import { useCurrentUser } from '../../../lib/current-user';

function InviteForm() {
  const invite = useInviteTeammate();
  const toast = useToast();
  const [banner, setBanner] = useState<string>();
  const { register, handleSubmit, setError, formState, reset } = useForm<InviteInput>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { role: 'assistant_brewer' },
  });
  const onSubmit = handleSubmit(async (values) => {
    setBanner(undefined);
    try {
      await invite.mutateAsync(values);
      toast(`Invitation sent to ${values.email}`);
      reset({ email: '', role: values.role });
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });
  return (
    <Card>
      <h2 className="mb-4 text-xl font-bold">Invite a teammate</h2>
      <form onSubmit={onSubmit} className="space-y-4" noValidate>
        <FormBanner message={banner} />
        <TextField label="E-mail" type="email" {...register('email')} error={formState.errors.email?.message} />
        <SelectField label="Role" {...register('role')} error={formState.errors.role?.message}>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </SelectField>
        <Button type="submit" busy={invite.isPending}>
          Send invitation
        </Button>
      </form>
    </Card>
  );
}

/** A teammate's role: choosing another one asks before it takes effect (it changes what they may open at once). */
function RoleChoice({
  member,
  onChange,
}: {
  member: Team['members'][number];
  onChange: (role: Role) => Promise<void>;
}) {
  const [role, setRole] = useState<Role>(member.role);
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <select
        aria-label={`Role of ${member.displayName}`}
        className="min-h-touch rounded-lg border-2 border-mist-300 bg-white px-2"
        value={role}
        onChange={(e) => setRole(e.target.value as Role)}
      >
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </select>
      {role !== member.role && (
        <>
          <Button variant="danger" onClick={() => onChange(role)}>
            Make {ROLE_LABELS[role].toLowerCase()}
          </Button>
          <Button variant="quiet" onClick={() => setRole(member.role)}>
            Cancel
          </Button>
        </>
      )}
    </span>
  );
}

export function TeamPage() {
  const team = useTeam();
  const update = useUpdateMember();
  const me = useCurrentUser();
  const toast = useToast();

  const refused = (error: unknown) => toast(error instanceof Error ? error.message : 'Not saved', 'error');
  const change = async (id: number, input: { role?: Role; disabled?: boolean }, done: string) => {
    try {
      await update.mutateAsync({ id, ...input });
      toast(done);
    } catch (error) {
      refused(error);
    }
  };

  return (
    <>
      <PageHeader title="Team" subtitle="Who works in this brewery, and what each person may do." />
      <div className="grid gap-6 xl:grid-cols-[2fr_1fr]">
        <div className="space-y-6">
          {team.isPending && <Loading />}
          {team.isError && <ErrorState error={team.error} onRetry={() => team.refetch()} />}
          {team.data && (
            <>
              <Table>
                <thead>
                  <tr>
                    <Th>Name</Th>
                    <Th>E-mail</Th>
                    <Th>Role</Th>
                    <Th>Access</Th>
                  </tr>
                </thead>
                <tbody>
                  {team.data.members.map((m) => (
                    <tr key={m.id} className={m.disabled ? 'text-ink-300' : undefined}>
                      <Td className="font-medium">{m.displayName}</Td>
                      <Td>{m.email}</Td>
                      <Td>
                        {m.id === me.id ? (
                          ROLE_LABELS[m.role]
                        ) : (
                          <RoleChoice
                            member={m}
                            onChange={(role) =>
                              change(m.id, { role }, `${m.displayName} is now ${ROLE_LABELS[role].toLowerCase()}`)
                            }
                          />
                        )}
                      </Td>
                      <Td>
                        {m.id === me.id ? (
                          'You'
                        ) : m.disabled ? (
                          <Button
                            variant="secondary"
                            onClick={() => change(m.id, { disabled: false }, `${m.displayName} can sign in again`)}
                          >
                            Restore access
                          </Button>
                        ) : (
                          <ConfirmButton
                            ask="Block access…"
                            confirm={`Block ${m.displayName}`}
                            act={() => update.mutateAsync({ id: m.id, disabled: true })}
                            onDone={() => toast(`${m.displayName} is signed out and blocked`)}
                            onRefused={refused}
                          />
                        )}
                      </Td>
                    </tr>
                  ))}
                </tbody>
              </Table>
              {team.data.pendingInvites.length > 0 && (
                <Card>
                  <h2 className="mb-2 text-lg font-bold">Invitations waiting</h2>
                  <ul className="space-y-1">
                    {team.data.pendingInvites.map((i) => (
                      <li key={i.id}>
                        {i.email} · {ROLE_LABELS[i.role]} · link valid until {new Date(i.expiresAt).toLocaleString()}
                      </li>
                    ))}
                  </ul>
                </Card>
              )}
            </>
          )}
        </div>
        <InviteForm />
      </div>
    </>
  );
}
