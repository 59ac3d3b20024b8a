import { useState } from 'react';
import { BATCH_STATUS_LABELS, STATUS_TRANSITIONS, type BatchStatus } from '../../../../shared/schemas/batches';
import { Button, Card, TextField } from '../../../components/ui';
import { ApiError } from '../../../lib/api-client';
import { useChangeStatus } from '../api/change-status';
import { useCan } from '../../../lib/current-user';

/** Moves the batch to its next status, or (for whoever may dump it) dumps it with a reason. */
export function StatusCard({ batchId, status }: { batchId: number; status: BatchStatus }) {
  const change = useChangeStatus(batchId);
  const mayDump = useCan('batch.dump');
  const [reason, setReason] = useState('');
  const [dumping, setDumping] = useState(false);
  const next = STATUS_TRANSITIONS[status].filter((s) => s !== 'dumped');
  const canDump = STATUS_TRANSITIONS[status].includes('dumped') && mayDump;
  if (!next.length && !canDump) return null;
  const error = change.error instanceof ApiError ? (change.error.fields.reason ?? change.error.message) : undefined;
  return (
    <Card className="p-4">
      <h2 className="text-lg font-bold">Batch status: {BATCH_STATUS_LABELS[status]}</h2>
      <div className="mt-2 flex flex-wrap gap-2">
        {next.map((s) => (
          <Button key={s} variant="secondary" busy={change.isPending} onClick={() => change.mutate({ status: s })}>
            Move to {BATCH_STATUS_LABELS[s].toLowerCase()}
          </Button>
        ))}
        {canDump && !dumping && (
          <Button variant="quiet" onClick={() => setDumping(true)}>
            Dump…
          </Button>
        )}
      </div>
      {canDump && dumping && (
        <form
          className="mt-3 space-y-2"
          onSubmit={(e) => {
            e.preventDefault();
            change.mutate(
              { status: 'dumped', reason },
              {
                onSuccess: () => {
                  setDumping(false);
                  setReason('');
                },
              },
            );
          }}
        >
          <TextField
            label="Why is it dumped?"
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            error={error}
          />
          <Button type="submit" variant="danger" busy={change.isPending}>
            Dump the batch
          </Button>
        </form>
      )}
      {!dumping && error && (
        <p role="alert" className="mt-2 text-ember-700">
          {error}
        </p>
      )}
    </Card>
  );
}
