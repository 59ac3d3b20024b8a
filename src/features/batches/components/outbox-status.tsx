import { useEffect, useState } from 'react';
import { useLocation, useNavigate } from 'react-router-dom';
import { Button, Dialog } from '../../../components/ui';
import { outbox, useOutbox } from '../../../lib/outbox';
import { forgetOfflineAnswers } from '../../../lib/service-worker';
import { useSignOut } from '../../../lib/sign-out';
import { useCurrentUser } from '../../../lib/current-user';

/** Shown when the session ended with writes waiting: they are kept, and sent with their original keys after signing in. */
export function OutboxBanner() {
  const { items, needsSignIn, user } = useOutbox();
  const navigate = useNavigate();
  const location = useLocation();
  const me = useCurrentUser();
  // Mounted inside the signed-in layout: a (new) session exists, so this person's waiting items can go.
  useEffect(() => outbox().setUser({ id: me.id, displayName: me.displayName }), [me.id, me.displayName]);
  if (!needsSignIn) return null;
  const waiting = items.filter((i) => i.state === 'waiting' && i.userId === user?.id).length;
  return (
    <div role="alert" className="no-print bg-brass-400 px-4 py-3 text-ink-900">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center justify-between gap-3">
        <p className="font-semibold">
          Your session ended. {waiting} entries are kept on this tablet and will be sent once you sign in again.
        </p>
        <Button onClick={() => navigate('/sign-in', { state: { from: location.pathname } })}>Sign in again</Button>
      </div>
    </div>
  );
}

/** Sign out, warning first when entries are still waiting on this device. */
export function SignOutButton({ onSignedOut }: { onSignedOut: () => void }) {
  const signOut = useSignOut();
  const { items, user } = useOutbox();
  const [asking, setAsking] = useState(false);
  const waiting = items.filter((i) => i.state === 'waiting' && i.userId === user?.id).length;
  const leave = async (discard: boolean) => {
    if (discard) await outbox().discardMine();
    await signOut.mutateAsync();
    await forgetOfflineAnswers();
    onSignedOut();
  };
  return (
    <>
      <Button variant="onDark" busy={signOut.isPending} onClick={() => (waiting ? setAsking(true) : void leave(false))}>
        Sign out
      </Button>
      <Dialog open={asking} onClose={() => setAsking(false)} title="Entries are still waiting to be sent">
        <p>
          {waiting} {waiting === 1 ? 'entry has' : 'entries have'} not reached Kettlewright yet. Stay signed in until
          the connection returns and they are sent. Signing out now discards them from this tablet.
        </p>
        <div className="mt-4 flex flex-wrap justify-end gap-2">
          <Button variant="danger" onClick={() => void leave(true)}>
            Discard and sign out
          </Button>
          <Button size="lg" onClick={() => setAsking(false)}>
            Stay signed in
          </Button>
        </div>
      </Dialog>
    </>
  );
}
