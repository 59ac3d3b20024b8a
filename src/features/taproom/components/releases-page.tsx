import { EmptyState, ErrorState, LinkButton, Loading, PageHeader, Table, Td, Th } from '../../../components/ui';
import { BATCH_STATUS_LABELS, type BatchStatus } from '../../../../shared/schemas/batches';
import { useReleases } from '../api/list-releases';
import { useCan } from '../../../lib/current-user';
import { wasReleased } from '../../../../shared/schemas/taproom';

const STATE_TEXT = {
  draft: 'Sheet drafted',
  coming_soon: 'Shown as coming soon',
  on_tap: 'On tap',
  off_tap: 'Off tap',
} as const;

/** The head brewer's list of batches with beer to release, and where each release stands. */
export function ReleasesPage() {
  const mayRelease = useCan('release.manage');
  const releases = useReleases();
  return (
    <>
      <PageHeader
        title="Tasting and release"
        subtitle="Taste each beer, write its taproom sheet, and release it once it is packaged."
      />
      {releases.isPending ? (
        <Loading label="Loading batches" />
      ) : releases.isError ? (
        <ErrorState error={releases.error} onRetry={() => releases.refetch()} />
      ) : releases.data.length === 0 ? (
        <EmptyState title="No batch is fermenting, conditioning or packaged yet" />
      ) : (
        <Table>
          <thead>
            <tr>
              <Th>Batch</Th>
              <Th>Beer</Th>
              <Th>Status</Th>
              <Th>Release</Th>
              <Th>
                <span className="sr-only">Open</span>
              </Th>
            </tr>
          </thead>
          <tbody>
            {releases.data.map((r) => (
              <tr key={r.batchId}>
                <Td>{r.number}</Td>
                <Td>{r.beerName}</Td>
                <Td>{BATCH_STATUS_LABELS[r.status as BatchStatus]}</Td>
                <Td>{r.state ? STATE_TEXT[r.state] : 'Not started'}</Td>
                <Td>
                  <span className="flex flex-wrap gap-2">
                    <LinkButton variant="quiet" to={`/batches/${r.batchId}/tasting`}>
                      Tasting notes
                    </LinkButton>
                    {mayRelease && (
                      <LinkButton
                        variant="primary"
                        to={`/batches/${r.batchId}/release`}
                        aria-label={`Release ${r.beerName} (${r.number})`}
                      >
                        {wasReleased(r.state) ? 'View release' : 'Prepare release'}
                      </LinkButton>
                    )}
                  </span>
                </Td>
              </tr>
            ))}
          </tbody>
        </Table>
      )}
    </>
  );
}
