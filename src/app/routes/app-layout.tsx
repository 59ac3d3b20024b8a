import { Navigate, NavLink, Outlet, ScrollRestoration, useLocation, useMatches, useNavigate } from 'react-router-dom';
import { useMe } from '../../lib/current-user';
import { can, rolesFor } from '../../../shared/policy';
import { OutboxBanner, SignOutButton } from '../../features/batches/components/outbox-status';
import { ROLE_LABELS } from '../../../shared/schemas/roles';
import { ErrorState, Loading, cx } from '../../components/ui';
import { navFor, pageAction } from '../navigation';
import { NotForYourRole } from './not-for-your-role';
import { useRefreshOnDelivery } from '../../lib/outbox';

/** The signed-in shell: the brewery's name, the menu for the person's role, and the page. */
export function AppLayout() {
  const me = useMe();
  const location = useLocation();
  const navigate = useNavigate();
  const action = pageAction(useMatches());
  useRefreshOnDelivery();

  if (me.isPending) return <Loading label="Opening Kettlewright" />;
  if (me.isError)
    return (
      <div className="p-6">
        <ErrorState error={me.error} onRetry={() => me.refetch()} />
      </div>
    );
  if (!me.data) return <Navigate to="/sign-in" replace state={{ from: location.pathname }} />;
  const user = me.data;

  return (
    <div className="min-h-screen">
      <header className="no-print sticky top-0 z-40 bg-cellar-800 text-white shadow">
        {/* Who and where on top, the menu below: it wraps onto a second line on a narrow screen, so no item hides off the edge. */}
        <div className="mx-auto flex max-w-7xl items-center justify-between gap-4 px-4 pt-2">
          <NavLink to="/" className="flex min-h-touch items-center gap-2 font-bold">
            <img src="/kettle.svg" alt="" className="h-8 w-8" />
            <span className="text-lg">{user.brewery.name}</span>
          </NavLink>
          <div className="flex shrink-0 items-center gap-3">
            <span className="hidden text-sm text-cellar-100 sm:inline">
              {user.displayName} · {ROLE_LABELS[user.role]}
            </span>
            <SignOutButton onSignedOut={() => navigate('/sign-in', { replace: true })} />
          </div>
        </div>
        <nav aria-label="Main" className="mx-auto flex max-w-7xl flex-wrap gap-1 px-3 pb-2 pt-1">
          {navFor((a) => can(user.role, a)).map((item) => (
            <NavLink
              key={item.to}
              to={item.to}
              end={item.to === '/'}
              className={({ isActive }) =>
                cx(
                  'flex min-h-touch shrink-0 items-center rounded-lg px-3 font-semibold',
                  isActive ? 'bg-brass-400 text-cellar-900' : 'text-cellar-100 hover:bg-cellar-700',
                )
              }
            >
              {item.label}
            </NavLink>
          ))}
        </nav>
      </header>
      <OutboxBanner />
      <main className="mx-auto max-w-7xl px-4 py-6">
        {action && !can(user.role, action) ? <NotForYourRole roles={rolesFor(action)} /> : <Outlet />}
      </main>
      {/* A new page opens at its top, not at the previous page's scroll position. */}
      <ScrollRestoration />
    </div>
  );
}
