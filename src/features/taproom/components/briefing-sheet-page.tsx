import { useParams } from 'react-router-dom';
import { Button, Caution, ErrorState, LinkButton, Loading, PageHeader, cx } from '../../../components/ui';
import { useCurrentUser } from '../../../lib/current-user';
import { srmToEbc } from '../../../../shared/brewing';
import { useBeer } from '../api/get-beer';
import {
  ColourSwatch,
  abvText,
  allergensLine,
  offFlavoursLine,
  packagesLine,
  servingLine,
  tastingLine,
} from './beer-facts';

function Fact({ label, className, children }: { label: string; className?: string; children: React.ReactNode }) {
  return (
    <div className={cx('min-w-0 rounded-lg border border-mist-200 px-4 py-3 print:border-ink-300', className)}>
      <div className="text-xs font-semibold uppercase tracking-wide text-ink-500">{label}</div>
      <div className="whitespace-nowrap text-3xl font-semibold tabular-nums text-ink-900">{children}</div>
    </div>
  );
}

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="break-inside-avoid">
      <h2 className="mb-1 text-lg font-bold text-cellar-800 print:text-ink-900">{title}</h2>
      <div className="text-ink-900">{children}</div>
    </section>
  );
}

/** One page a shift lead prints and pins up: what the beer is, how to pour it, what to tell guests. */
export function BriefingSheetPage() {
  const beerId = Number(useParams().beerId);
  const me = useCurrentUser();
  const beer = useBeer(beerId);
  if (beer.isPending) return <Loading label="Opening the briefing sheet" />;
  if (beer.isError) return <ErrorState error={beer.error} onRetry={() => beer.refetch()} />;
  const b = beer.data;
  const tasting = tastingLine(b.tasting);
  const date = (iso: string) =>
    new Intl.DateTimeFormat('en-GB', { dateStyle: 'long', timeZone: me.brewery.timeZone }).format(new Date(iso));
  const when =
    b.state === 'off_tap'
      ? `Off tap${b.offTapAt ? ` since ${date(b.offTapAt)}` : ''} (kept for the record)`
      : b.releasedAt
        ? `On tap since ${date(b.releasedAt)}`
        : 'Coming soon';

  return (
    <>
      <PageHeader
        title="Staff briefing sheet"
        subtitle="Print it for the bar, or read it before the shift."
        actions={
          <>
            <LinkButton variant="quiet" to="/taproom">
              Back to the taproom
            </LinkButton>
            <Button onClick={() => window.print()}>Print</Button>
          </>
        }
      />
      <article
        aria-label={`Briefing: ${b.beerName}`}
        className="mx-auto max-w-4xl space-y-6 rounded-xl bg-white p-4 shadow-sm sm:p-6 print:max-w-none print:p-0 print:shadow-none"
      >
        <header className="flex flex-wrap items-start justify-between gap-4 border-b-2 border-ink-900 pb-4">
          <div className="min-w-0">
            <h2 className="break-words text-4xl font-bold text-ink-900">{b.beerName}</h2>
            <p className="mt-1 text-xl text-ink-700">{b.style}</p>
            <p className="mt-1 text-ink-500">
              <span className="whitespace-nowrap">Batch {b.batchNumber}</span> · {when} · {me.brewery.name}
            </p>
          </div>
          {b.photo && (
            <img
              src={b.photo.thumbnailUrl}
              alt={`${b.beerName} in the glass`}
              className="h-40 w-40 rounded-lg object-cover"
            />
          )}
        </header>

        {/* Two across on a phone, the colour (swatch and EBC) below on its own row; three across from a tablet and on paper. */}
        <div className="grid grid-cols-2 gap-3 md:grid-cols-3 print:grid-cols-3">
          <Fact label={b.abvIsPlanned ? 'ABV (planned)' : 'ABV'}>{abvText(b)}</Fact>
          <Fact label="Bitterness">{b.ibu.toFixed(0)} IBU</Fact>
          <Fact label="Colour" className="col-span-2 md:col-span-1 print:col-span-1">
            <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <ColourSwatch srm={b.srm} />
              <span className="text-base font-medium text-ink-500">EBC {srmToEbc(b.srm).toFixed(0)}</span>
            </span>
          </Fact>
        </div>

        <Section title="What to tell guests">
          <p className="text-lg leading-relaxed">{b.description}</p>
        </Section>

        <div className="grid gap-6 sm:grid-cols-2 print:grid-cols-2">
          <Section title="How to serve">
            <p>{servingLine(b, me.brewery.unitSystem)}</p>
            {b.servingNotes && <p className="mt-1">{b.servingNotes}</p>}
          </Section>
          <Section title="Allergens">
            <p>{allergensLine(b)}</p>
          </Section>
          <Section title="How the brewery tasted it">
            {tasting ? (
              <>
                <p>{tasting}</p>
                {b.tasting.aroma && <p className="mt-1">Aroma: {b.tasting.aroma}</p>}
                {b.tasting.flavour && <p className="mt-1">Flavour: {b.tasting.flavour}</p>}
                {b.tasting.offFlavours.length > 0 && (
                  <p className="mt-1">Noted by tasters: {offFlavoursLine(b.tasting)}</p>
                )}
              </>
            ) : (
              <p>No tasting notes yet.</p>
            )}
          </Section>
          <Section title="Available as">
            <p>{b.packageSizes.length ? packagesLine(b.packageSizes) : 'Not packaged yet'}</p>
          </Section>
        </div>

        <Caution title="Serving alcohol">
          Check ID and refuse service to anyone who is intoxicated, as your licence and local law require. Allergen
          information comes from the brewery’s records: for a guest with a severe allergy, confirm with the head brewer
          before recommending a beer.
        </Caution>
      </article>
    </>
  );
}
