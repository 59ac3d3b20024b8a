import { useParams } from 'react-router-dom';
import { Button, ErrorState, Loading } from '../../../components/ui';
import { useCurrentUser } from '../../../lib/current-user';
import { useBatch } from '../api/get-batch';
import { brewDaySteps } from '../../../../shared/batches/brew-day';
import { BATCH_STATUS_LABELS } from '../../../../shared/schemas/batches';
import { show } from '../../../lib/units';
import { ActualsCard } from './actuals-card';
import { LogList } from './log-list';
import { QrCode } from '../../../components/qr-code';
import { Signatures } from './sign-off-panel';
import { showSg } from './format';

/** The printable batch record: plan, every entry, signatures with name, date-time and zone, meaning, and QR labels. */
export function BatchRecordPage() {
  const id = Number(useParams().batchId);
  const me = useCurrentUser();
  const batch = useBatch(id);
  if (batch.isPending) return <Loading label="Opening the record" />;
  if (batch.isError) return <ErrorState error={batch.error} onRetry={() => batch.refetch()} />;
  const b = batch.data;
  const { computed } = b.plan;
  const system = me.brewery.unitSystem;
  return (
    <article className="space-y-5 print:text-sm">
      <header className="flex items-start justify-between gap-4">
        <div>
          <h1 className="text-3xl font-bold">Batch record {b.number}</h1>
          <p className="text-lg">
            {b.beerName} · {BATCH_STATUS_LABELS[b.status]} · brewed {b.brewDate} · {b.plan.equipmentName}
            {b.plan.versionNumber !== undefined && ` · recipe version ${b.plan.versionNumber}`}
          </p>
          <p className="tabular-nums">
            Planned OG {showSg(computed.og)} · FG {showSg(computed.fg)} · {computed.ibu.toFixed(0)} IBU · into fermenter{' '}
            {show(system, 'volume', computed.volumes.intoFermenterL)}
          </p>
          <p className="text-sm text-ink-500">Times in {me.brewery.timeZone}.</p>
        </div>
        <Button className="no-print" onClick={() => window.print()}>
          Print
        </Button>
      </header>
      <section className="flex gap-6" aria-label="QR labels">
        <QrCode path={`/batches/${b.id}/label`} label={`Batch ${b.number}`} />
        {b.vessel && <QrCode path={`/cellar?vessel=${b.vessel.id}`} label={b.vessel.name} />}
      </section>
      <section>
        <h2 className="text-xl font-bold">Brew-day steps planned</h2>
        <p>
          {brewDaySteps(b.plan)
            .map((s) => s.label)
            .join(' → ')}
        </p>
      </section>
      <ActualsCard actuals={b.actuals} system={system} />
      <section>
        <h2 className="text-xl font-bold">Log</h2>
        <LogList batchId={b.id} entries={b.entries} system={system} timeZone={me.brewery.timeZone} />
      </section>
      <section>
        <h2 className="text-xl font-bold">Signatures</h2>
        {b.signatures.length ? (
          <Signatures signatures={b.signatures} timeZone={me.brewery.timeZone} />
        ) : (
          <p>Not signed yet.</p>
        )}
      </section>
    </article>
  );
}
