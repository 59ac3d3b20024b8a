import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import { Card, Loading, PageHeader } from '../../components/ui';
import { useCurrentUser, usePermissions } from '../../lib/current-user';
import { BREWING_HOME, navFor } from '../navigation';

function greeting(hour: number): string {
  if (hour < 12) return 'Good morning';
  if (hour < 18) return 'Good afternoon';
  return 'Good evening';
}

// The taproom manager's home is the tap list, loaded in its own chunk.
const TaproomHome = lazy(() =>
  import('../../features/taproom/components/taproom-home').then((m) => ({ default: m.TaproomHome })),
);

export function HomePage() {
  const me = useCurrentUser();
  const may = usePermissions();
  if (!may(BREWING_HOME)) {
    return (
      <Suspense fallback={<Loading label="Opening the taproom" />}>
        <TaproomHome />
      </Suspense>
    );
  }
  const hour = Number(
    new Intl.DateTimeFormat('en-US', { hour: 'numeric', hourCycle: 'h23', timeZone: me.brewery.timeZone }).format(
      new Date(),
    ),
  );
  const places = navFor(may).filter((item) => item.to !== '/');
  return (
    <>
      <PageHeader title={`${greeting(hour)}, ${me.displayName.split(' ')[0]}`} subtitle={me.brewery.name} />
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {places.map((item) => (
          <Link key={item.to} to={item.to} className="block">
            <Card className="flex min-h-[96px] items-center text-xl font-semibold text-cellar-800 hover:border-cellar-600">
              {item.label} →
            </Card>
          </Link>
        ))}
      </div>
    </>
  );
}
