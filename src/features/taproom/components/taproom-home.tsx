import { Link, useSearchParams } from 'react-router-dom';
import { useDeferredValue } from 'react';
import { Card, EmptyState, ErrorState, Loading, PageHeader, SelectField, TextField } from '../../../components/ui';
import { useCurrentUser, useCan } from '../../../lib/current-user';
import { STRENGTHS, type Strength, type TaproomBeer, type TaproomListQuery } from '../../../../shared/schemas/taproom';
import { useBeers } from '../api/list-beers';
import { ColourSwatch, abvText, allergensLine, packagesLine, servingLine, tastingLine } from './beer-facts';

const linkButton =
  'inline-flex min-h-touch items-center justify-center rounded-lg px-4 font-semibold border-2 border-cellar-800 bg-white text-cellar-800 hover:bg-cellar-100';

function BeerCard({ beer }: { beer: TaproomBeer }) {
  const me = useCurrentUser();
  const tasting = tastingLine(beer.tasting);
  return (
    <Card className="flex flex-col gap-3" aria-label={beer.beerName}>
      {beer.photo && (
        <img
          src={beer.photo.thumbnailUrl}
          alt={`${beer.beerName} in the glass`}
          className="-mx-5 -mt-5 h-40 w-[calc(100%+2.5rem)] max-w-none rounded-t-xl object-cover"
        />
      )}
      <div className="flex items-start gap-4">
        <div className="min-w-0 flex-1">
          <h3 className="text-xl font-bold text-ink-900">{beer.beerName}</h3>
          <p className="text-ink-500">
            {beer.style} · <span className="whitespace-nowrap">Batch {beer.batchNumber}</span>
          </p>
        </div>
        <ColourSwatch srm={beer.srm} />
      </div>
      <dl className="grid grid-cols-2 gap-2">
        <div className="rounded-lg bg-mist-100 px-3 py-2">
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-500">
            ABV{beer.abvIsPlanned ? ' (planned)' : ''}
          </dt>
          <dd className="whitespace-nowrap text-3xl font-semibold tabular-nums text-ink-900">{abvText(beer)}</dd>
        </div>
        <div className="rounded-lg bg-mist-100 px-3 py-2">
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-500">IBU</dt>
          <dd className="text-3xl font-semibold tabular-nums text-ink-900">{beer.ibu.toFixed(0)}</dd>
        </div>
      </dl>
      <p className="text-ink-700">{beer.description}</p>
      <dl className="space-y-1 text-sm">
        {tasting && (
          <div>
            <dt className="inline font-semibold text-ink-700">Tasting: </dt>
            <dd className="inline text-ink-700">
              {tasting}
              {beer.tasting.aroma ? ` — ${beer.tasting.aroma}; ${beer.tasting.flavour}` : ''}
            </dd>
          </div>
        )}
        <div>
          <dt className="inline font-semibold text-ink-700">Serve: </dt>
          <dd className="inline text-ink-700">
            {servingLine(beer, me.brewery.unitSystem)}
            {beer.servingNotes ? ` · ${beer.servingNotes}` : ''}
          </dd>
        </div>
        <div>
          <dt className="inline font-semibold text-ink-700">Allergens: </dt>
          <dd className="inline text-ink-700">{allergensLine(beer)}</dd>
        </div>
        {beer.packageSizes.length > 0 && (
          <div>
            <dt className="inline font-semibold text-ink-700">Packaged: </dt>
            <dd className="inline text-ink-700">{packagesLine(beer.packageSizes)}</dd>
          </div>
        )}
      </dl>
      <div className="mt-auto pt-1">
        <Link to={`/taproom/beers/${beer.id}/briefing`} className={linkButton}>
          Staff briefing sheet
        </Link>
      </div>
    </Card>
  );
}

function Shelf({ title, beers, empty }: { title: string; beers: TaproomBeer[]; empty: string }) {
  return (
    <section className="mb-8" aria-label={title}>
      <h2 className="mb-3 text-xl font-bold text-ink-900">
        {title} <span className="text-ink-500">({beers.length})</span>
      </h2>
      {beers.length ? (
        <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
          {beers.map((b) => (
            <BeerCard key={b.id} beer={b} />
          ))}
        </div>
      ) : (
        <EmptyState title={empty} />
      )}
    </section>
  );
}

/** The taproom manager's home: what is pouring, what is coming, and how to talk about it. */
export function TaproomHome() {
  const me = useCurrentUser();
  const mayReadReleases = useCan('release.read');
  const [params, setParams] = useSearchParams();
  const q = params.get('q') ?? '';
  const style = params.get('style') ?? '';
  const strength = (params.get('strength') ?? '') as Strength | '';
  const deferredQ = useDeferredValue(q.trim());
  const query: TaproomListQuery = {
    q: deferredQ || undefined,
    style: style || undefined,
    strength: strength || undefined,
  };
  const beers = useBeers(query);

  const setParam = (name: string, value: string) =>
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        if (value) next.set(name, value);
        else next.delete(name);
        return next;
      },
      { replace: true },
    );

  return (
    <>
      <PageHeader
        title="Taproom"
        subtitle={`${me.brewery.name} — beers on tap and coming soon`}
        actions={
          <>
            {mayReadReleases && (
              <Link to="/releases" className={linkButton}>
                Tasting and release
              </Link>
            )}
            <Link to="/taproom/board" className={linkButton}>
              Bar screen
            </Link>
          </>
        }
      />
      <form role="search" className="mb-6 grid gap-3 sm:grid-cols-3" onSubmit={(e) => e.preventDefault()}>
        <TextField
          label="Search beers"
          type="search"
          value={q}
          placeholder="Name, style or description"
          onChange={(e) => setParam('q', e.target.value)}
        />
        <SelectField label="Style" value={style} onChange={(e) => setParam('style', e.target.value)}>
          <option value="">All styles</option>
          {beers.data?.styles.map((s) => (
            <option key={s} value={s}>
              {s}
            </option>
          ))}
        </SelectField>
        <SelectField label="Strength" value={strength} onChange={(e) => setParam('strength', e.target.value)}>
          <option value="">Any strength</option>
          {Object.entries(STRENGTHS).map(([id, band]) => (
            <option key={id} value={id}>
              {band.label}
            </option>
          ))}
        </SelectField>
      </form>
      {beers.isPending ? (
        <Loading label="Reading the tap list" />
      ) : beers.isError ? (
        <ErrorState error={beers.error} onRetry={() => beers.refetch()} />
      ) : (
        <>
          <Shelf
            title="On tap"
            beers={beers.data.beers.filter((b) => b.state === 'on_tap')}
            empty={q || style || strength ? 'Nothing on tap matches' : 'Nothing released yet'}
          />
          <Shelf
            title="Coming soon"
            beers={beers.data.beers.filter((b) => b.state === 'coming_soon')}
            empty="Nothing announced yet"
          />
        </>
      )}
    </>
  );
}
