import { Navigate, useParams } from 'react-router-dom';
import { ErrorState, Loading } from '../../../components/ui';
import { batchStagePath } from '../../../../shared/schemas/batches';
import { useBatch } from '../api/get-batch';

/** Where a batch's printed QR label lands: it opens the page for the stage the batch is in now. */
export function BatchLabelPage() {
  const id = Number(useParams().batchId);
  const batch = useBatch(id);
  if (batch.isPending) return <Loading label="Opening the batch" />;
  if (batch.isError) return <ErrorState error={batch.error} onRetry={() => batch.refetch()} />;
  return <Navigate to={batchStagePath(id, batch.data.status)} replace />;
}
