import { Button, EmptyState, ErrorState, LinkButton, Loading, PageHeader } from '../../../components/ui';
import { QrCode } from '../../../components/qr-code';
import { VESSEL_TYPE_LABELS } from '../labels';
import { useVessels } from '../../../lib/vessels';

/**
 * A sheet of labels, one per vessel, to print and fix to the tanks: scanning one on the tablet opens
 * whatever batch is in that vessel now (the vessel board's `?vessel=` link).
 */
export function VesselLabelsPage() {
  const { data, error, isPending, refetch } = useVessels();
  if (isPending) return <Loading label="Loading the vessels" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  return (
    <>
      <PageHeader
        title="Vessel labels"
        subtitle="Print on weatherproof label stock. Scanning a label opens the batch in that vessel now."
        actions={
          <div className="no-print flex gap-2">
            <LinkButton variant="quiet" to="/cellar/vessels">
              Vessels
            </LinkButton>
            <Button onClick={() => window.print()}>Print</Button>
          </div>
        }
      />
      {data.length === 0 ? (
        <EmptyState title="No vessels yet" />
      ) : (
        <section aria-label="Labels" className="flex flex-wrap gap-6">
          {data.map((v) => (
            <div key={v.id} className="break-inside-avoid">
              <QrCode path={`/cellar?vessel=${v.id}`} label={`${v.name} · ${VESSEL_TYPE_LABELS[v.type]}`} size={200} />
            </div>
          ))}
        </section>
      )}
    </>
  );
}
