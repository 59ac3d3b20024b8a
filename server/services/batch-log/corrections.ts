/** Entries are never changed: a mistake is put right by a correction entry that points at it. */
import { BatchLogEntry } from '../../models';
import { methodNotAllowed, notFound, unprocessable } from '../../errors';

/** What a correction may point at: an entry of the same batch's log (`targetKind` null otherwise), never a signature. */
export function checkCorrectionTarget(targetKind: string | null): void {
  if (targetKind === null) throw unprocessable('The entry to correct is not in this batch’s log.');
  if (targetKind === 'sign_off') throw unprocessable('A signature cannot be corrected.');
}

/** Entries are append-only: a change or delete is refused (405), after the usual 404 for another brewery's entry. */
export async function refuseEntryChange(breweryId: number, batchId: number, entryId: number): Promise<never> {
  const entry = await BatchLogEntry.findOne({ where: { id: entryId, batchId, breweryId } });
  if (!entry) throw notFound('This log entry');
  throw methodNotAllowed(
    'Log entries are never changed or deleted. Add a correction that points at the entry instead.',
  );
}
