import { useQuery } from '@tanstack/react-query';
import { ErrorState, LinkButton, Loading } from '../../../components/ui';
import { useCurrentUser } from '../../../app/current-user';
import { beersQuery } from '../api/list-beers';
import { ColourSwatch, abvText, servingLine } from './beer-facts';

/** Refresh the screen behind the bar every few minutes, so a new release appears without anyone touching it. */
const REFRESH_MS = 5 * 60 * 1000;

/** Large type for a screen behind the bar: the tap list, readable across the room. */
export function BarBoardPage() {
  const me = useCurrentUser();
  const beers = useQuery({ ...beersQuery({}), refetchInterval: REFRESH_MS });
  const onTap = beers.data?.beers.filter((b) => b.state === 'on_tap') ?? [];
  const soon = beers.data?.beers.filter((b) => b.state === 'coming_soon') ?? [];

  return (
    <div className="fixed inset-0 z-50 overflow-auto bg-cellar-900 p-8 text-white">
      <header className="mb-8 flex items-center justify-between gap-4">
        <h1 className="text-5xl font-bold">On tap at {me.brewery.name}</h1>
        <LinkButton variant="onDark" className="no-print" to="/taproom">
          Close
        </LinkButton>
      </header>
      {beers.isPending ? (
        <Loading label="Reading the tap list" />
      ) : beers.isError ? (
        <ErrorState error={beers.error} onRetry={() => beers.refetch()} />
      ) : (
        <>
          <ol className="space-y-6">
            {onTap.map((b) => (
              <li key={b.id} className="flex items-center gap-6 border-b border-white/20 pb-6">
                <span className="rounded-xl bg-white p-2">
                  <ColourSwatch srm={b.srm} size="lg" />
                </span>
                <div className="min-w-0 flex-1">
                  <p className="text-5xl font-bold leading-tight">{b.beerName}</p>
                  <p className="mt-1 text-2xl text-cellar-100">
                    {b.style} · {servingLine(b, me.brewery.unitSystem)}
                  </p>
                </div>
                <div className="text-right">
                  <p className="text-6xl font-bold tabular-nums text-brass-400">{abvText(b)}</p>
                  <p className="text-2xl text-cellar-100">{b.ibu.toFixed(0)} IBU</p>
                </div>
              </li>
            ))}
          </ol>
          {onTap.length === 0 && <p className="text-4xl">Nothing on tap yet.</p>}
          {soon.length > 0 && (
            <p className="mt-10 text-3xl text-cellar-100">
              Coming soon: <span className="font-semibold text-white">{soon.map((b) => b.beerName).join(' · ')}</span>
            </p>
          )}
        </>
      )}
    </div>
  );
}
