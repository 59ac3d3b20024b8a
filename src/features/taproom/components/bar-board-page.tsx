import { Fragment, useEffect, useRef } from 'react';
import { useLocation, useNavigate } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { Button, ErrorState, Loading } from '../../../components/ui';
import { useCurrentUser } from '../../../lib/current-user';
import { beersQuery } from '../api/list-beers';
import { ColourSwatch, abvText, servingParts } from './beer-facts';
import { FullScreenView } from './full-screen-view';

/** Refresh the screen behind the bar every few minutes, so a new release appears without anyone touching it. */
const REFRESH_MS = 5 * 60 * 1000;

/**
 * Large type for a screen behind the bar: the tap list, readable across the room on a TV, and still whole on a
 * phone. It covers the app; Close or Escape goes back to where the person came from (the taproom when the
 * board was opened on its own, as a TV's bookmark does).
 */
export function BarBoardPage() {
  const me = useCurrentUser();
  const navigate = useNavigate();
  const location = useLocation();
  const beers = useQuery({ ...beersQuery({}), refetchInterval: REFRESH_MS });
  const onTap = beers.data?.beers.filter((b) => b.state === 'on_tap') ?? [];
  const soon = beers.data?.beers.filter((b) => b.state === 'coming_soon') ?? [];
  const title = `On tap at ${me.brewery.name}`;
  const heading = useRef<HTMLHeadingElement>(null);
  // The link that opened the board is now under it: start reading (and tabbing) from the board's title.
  useEffect(() => heading.current?.focus(), []);
  const leave = () => (location.key === 'default' ? navigate('/taproom', { replace: true }) : navigate(-1));

  return (
    <FullScreenView label={title} onLeave={leave} className="bg-cellar-900 p-4 text-white sm:p-8">
      <header className="mb-6 flex items-start justify-between gap-4 sm:mb-8">
        <h1
          ref={heading}
          tabIndex={-1}
          className="min-w-0 break-words text-3xl font-bold leading-tight outline-none sm:text-4xl lg:text-5xl"
        >
          {title}
        </h1>
        <Button variant="onDark" className="no-print shrink-0" onClick={leave} aria-keyshortcuts="Escape">
          Close
        </Button>
      </header>
      {beers.isPending ? (
        <Loading label="Reading the tap list" />
      ) : beers.isError ? (
        <ErrorState error={beers.error} onRetry={() => beers.refetch()} />
      ) : (
        <>
          <ol className="space-y-5 sm:space-y-6">
            {onTap.map((b) => (
              <li key={b.id} className="flex items-center gap-4 border-b border-white/20 pb-5 sm:gap-6 sm:pb-6">
                {/* One width for every swatch, so the names beside them start on one line. */}
                <span className="flex w-20 shrink-0 justify-center self-start rounded-xl bg-white p-2 sm:w-24 sm:self-center">
                  <ColourSwatch srm={b.srm} size="lg" stacked />
                </span>
                <div className="min-w-0 flex-1 sm:flex sm:items-center sm:gap-6">
                  <div className="min-w-0 sm:flex-1">
                    <p className="break-words text-3xl font-bold leading-tight sm:text-4xl lg:text-5xl 2xl:text-6xl">
                      {b.beerName}
                    </p>
                    <p className="mt-1 text-lg text-cellar-100 sm:text-xl lg:text-2xl">
                      {b.style}
                      {servingParts(b, me.brewery.unitSystem).map((part) => (
                        <Fragment key={part}>
                          {' · '}
                          <span className="whitespace-nowrap">{part}</span>
                        </Fragment>
                      ))}
                    </p>
                  </div>
                  <div className="mt-2 flex items-baseline gap-3 whitespace-nowrap sm:mt-0 sm:block sm:text-right">
                    <p className="text-4xl font-bold tabular-nums text-brass-400 sm:text-5xl lg:text-6xl 2xl:text-7xl">
                      {abvText(b)}
                    </p>
                    <p className="text-lg text-cellar-100 sm:text-xl lg:text-2xl">{b.ibu.toFixed(0)} IBU</p>
                  </div>
                </div>
              </li>
            ))}
          </ol>
          {onTap.length === 0 && <p className="text-3xl sm:text-4xl">Nothing on tap yet.</p>}
          {soon.length > 0 && (
            <p className="mt-8 text-2xl text-cellar-100 sm:mt-10 lg:text-3xl">
              Coming soon: <span className="font-semibold text-white">{soon.map((b) => b.beerName).join(' · ')}</span>
            </p>
          )}
        </>
      )}
    </FullScreenView>
  );
}
