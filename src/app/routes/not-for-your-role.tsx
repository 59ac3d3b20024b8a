import { ROLE_LABELS, type Role } from '../../../shared/schemas/roles';
import { EmptyState, LinkButton } from '../../components/ui';

/** In place of a page the person's role may not open: who may, and the way home (no form that would only be refused). */
export function NotForYourRole({ roles }: { roles: readonly Role[] }) {
  const who = roles.map((r) => ROLE_LABELS[r].toLowerCase()).join(' or the ');
  return (
    <EmptyState title="Not open to your role" action={<LinkButton to="/">Go to the home screen</LinkButton>}>
      This page is for the {who}. Ask your head brewer if you need something from it.
    </EmptyState>
  );
}
