import { useMemo, type ReactNode } from 'react';
import { useParams } from 'react-router-dom';
import { apparentAttenuation, predictFermentation } from '../../../../shared/brewing';
import { entryWords } from '../../../../shared/batches/entry-words';
import { Card, ErrorState, LinkButton, Loading, PageHeader, Stat } from '../../../components/ui';
import { useCurrentUser, useCan } from '../../../lib/current-user';
import { useBatchCellar } from '../api/batch-cellar';
import { useVessels } from '../../../lib/vessels';
import { cellarGroup } from '../api/log-cellar-entry';
import { FermentationChart } from './fermentation-chart';
import { ReadingForm } from './reading-form';
import { ActionForm } from './action-form';
import { CarbonationPanel } from './carbonation-panel';
import { PackagingForm } from './packaging-form';
import { PackagingSummary } from './packaging-summary';
import { ProbeImport } from './probe-import';
import { PlanForm } from './plan-form';
import { PredictionNote } from './prediction-note';
import { AlertsPanel } from './alerts-panel';
import { OutboxPanel } from '../../../components/outbox-panel';
import { batchRoutes } from '../../../../shared/contract/batches';
import { pathOf } from '../../../../shared/contract/route';

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card>
      <h2 className="mb-3 text-xl font-bold">{title}</h2>
      {children}
    </Card>
  );
}

/** One batch in the cellar: its curve, readings, cellar work, carbonation and packaging. */
export function BatchCellarPage() {
  const batchId = Number(useParams().batchId);
  const me = useCurrentUser();
  const mayPlan = useCan('cellar.plan');
  const { data, error, refetch, isPending } = useBatchCellar(batchId);
  const vessels = useVessels();
  const prediction = useMemo(
    () => (data ? predictFermentation(data.readings.map((r) => ({ atMs: Date.parse(r.takenAt), sg: r.sg }))) : null),
    [data],
  );
  if (isPending) return <Loading label="Loading the batch" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;

  const system = me.brewery.unitSystem;
  const tz = me.brewery.timeZone;
  const latest = data.readings[data.readings.length - 1];
  const attenuation =
    latest && latest.sg <= data.og.sg && data.og.sg > 1 ? apparentAttenuation(data.og.sg, latest.sg) : null;
  const dateTime = new Intl.DateTimeFormat('en-US', {
    timeZone: tz,
    month: 'short',
    day: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  });
  const date = new Intl.DateTimeFormat('en-US', { timeZone: tz, weekday: 'short', month: 'short', day: 'numeric' });
  const active = ['brewing', 'fermenting', 'conditioning'].includes(data.batch.status);
  const wording = { system, vesselName: (id: number) => vessels.data?.find((v) => v.id === id)?.name };

  return (
    <div className="space-y-6">
      <PageHeader
        title={`${data.batch.beerName} · ${data.batch.number}`}
        subtitle={`${data.batch.status[0]!.toUpperCase()}${data.batch.status.slice(1)}${data.vessel ? ` in ${data.vessel.name}` : ''} · brewed ${data.batch.brewDate}`}
        actions={
          <LinkButton variant="quiet" to="/cellar">
            Vessel board
          </LinkButton>
        }
      />
      <div className="grid grid-cols-2 gap-3 md:grid-cols-4">
        <Stat label={data.og.measured ? 'OG (measured)' : 'OG (planned)'} value={data.og.sg.toFixed(3)} />
        <Stat label="Latest gravity" value={latest ? latest.sg.toFixed(3) : '—'} />
        <Stat
          label="Apparent attenuation so far"
          value={attenuation === null ? '—' : (attenuation * 100).toFixed(0)}
          unit={attenuation === null ? undefined : '%'}
        />
        <div
          className="rounded-lg border-2 border-dashed border-brass-500 bg-brass-100 px-4 py-3"
          data-testid="prediction"
        >
          <div className="text-xs font-semibold uppercase tracking-wide text-ink-700">Prediction from the curve</div>
          {prediction ? (
            <PredictionNote prediction={prediction} latestSg={latest?.sg ?? null} nowMs={Date.now()} date={date} />
          ) : (
            <div className="text-sm text-ink-700">
              Not enough of a curve yet: it needs three falling readings over some hours.
            </div>
          )}
        </div>
      </div>
      <AlertsPanel batchId={batchId} />
      <OutboxPanel
        group={cellarGroup(batchId)}
        timeZone={tz}
        noteUrl={pathOf(batchRoutes.appendLog.path, { id: batchId })}
      />
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <Section title="Fermentation curve">
          {data.readings.length ? (
            <FermentationChart
              readings={data.readings}
              actions={data.actions}
              plan={data.plan}
              prediction={prediction}
              unitSystem={system}
              timeZone={tz}
            />
          ) : (
            <p className="text-ink-500">No readings yet. The first one starts the curve.</p>
          )}
        </Section>
        {active && (
          <Section title="Log a reading">
            <ReadingForm key={data.readings.length} batchId={batchId} readings={data.readings} unitSystem={system} />
          </Section>
        )}
      </div>
      <Section title="Readings and cellar work">
        {data.readings.length > 0 && (
          <p className="mb-2 flex flex-wrap items-center gap-x-3 text-sm text-ink-500">
            <span>
              A reading typed wrong is corrected in the batch record; the original stays in the log beside the
              correction.
            </span>
            <LinkButton variant="quiet" className="underline" to={`/batches/${batchId}/record`}>
              Correct a reading
            </LinkButton>
          </p>
        )}
        <ul className="divide-y divide-mist-200" aria-label="Readings and cellar work">
          {[
            ...data.readings.map((r) => ({
              at: r.takenAt,
              key: `r${r.id}`,
              words: entryWords({ kind: 'reading', data: { ...r }, reason: null }, wording),
              corrected: r.corrected,
              who: r.authorName,
            })),
            ...data.actions.map((a) => ({
              at: a.at,
              key: `a${a.logEntryId}`,
              words: entryWords({ kind: 'action', data: { ...a }, reason: null }, wording),
              corrected: false,
              who: a.authorName,
            })),
          ]
            .sort((x, y) => y.at.localeCompare(x.at))
            .map((row) => (
              <li key={row.key} data-testid="cellar-row" className="flex flex-wrap justify-between gap-2 py-2">
                <span className="font-medium tabular-nums">
                  {[row.words.title, ...row.words.details, ...(row.corrected ? ['corrected'] : [])].join(' · ')}
                </span>
                <span className="text-sm text-ink-500">
                  {dateTime.format(new Date(row.at))} · {row.who}
                </span>
              </li>
            ))}
        </ul>
      </Section>
      {active && (
        <div className="grid gap-6 lg:grid-cols-2">
          <Section title="Log cellar work">
            <ActionForm batchId={batchId} plan={data.plan} unitSystem={system} />
          </Section>
          <Section title="Carbonation">
            {data.vessel ? (
              <CarbonationPanel batchId={batchId} vessel={data.vessel} plan={data.plan} unitSystem={system} />
            ) : (
              <p className="text-ink-500">This batch is in no vessel: put it in a tank to set its head pressure.</p>
            )}
          </Section>
        </div>
      )}
      {active && (
        <Section title="Import from a logging probe">
          <ProbeImport batchId={batchId} timeZone={tz} unitSystem={system} />
        </Section>
      )}
      <Section title="Packaging">
        {active ? (
          <PackagingForm batchId={batchId} packaging={data.packaging} unitSystem={system} />
        ) : (
          <PackagingSummary packaging={data.packaging} unitSystem={system} />
        )}
      </Section>
      <Section title="Cellar plan">
        <PlanForm batchId={batchId} plan={data.plan} unitSystem={system} canEdit={mayPlan} />
      </Section>
    </div>
  );
}
