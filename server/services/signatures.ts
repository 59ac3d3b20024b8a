/**
 * Sign-off of a brew day: the head brewer re-enters their password, and the signature stores a SHA-256
 * of exactly what was signed (the frozen plan and every entry before it). It shows as invalid when that changes.
 */
import { Transaction } from 'sequelize';
import { sequelize } from '../config/database';
import { Batch, BatchLogEntry, Brewery, User } from '../models';
import { conflict, notFound, signedOff, wrongPassword } from '../errors';
import { checkPassword } from './passwords';
import { appendLogEntry, brewDaySigned, canonicalJson, entryContent, sha256, type LogActor } from './batch-log';
import { BREW_DAY_KINDS, type Signature, type WriteMeta } from '../../shared/schemas/batch-log';

/** The document a sign-off covers: the batch's frozen plan and every entry before the signature. */
function signedDocument(batch: Batch, entriesBefore: readonly BatchLogEntry[]): string {
  return canonicalJson({
    batch: { id: batch.id, number: batch.number, beerName: batch.beerName, plan: batch.plan },
    entries: entriesBefore.map(entryContent),
  });
}

/** Signatures of a batch, each checked against what it signed as the database holds it now. */
export function signaturesOf(batch: Batch, rows: readonly BatchLogEntry[]): Signature[] {
  return rows
    .filter((r) => r.kind === 'sign_off')
    .map((r) => {
      const contentSha256 = String(r.data.contentSha256);
      const before = rows.filter((e) => e.sequence < r.sequence);
      return {
        entryId: Number(r.id),
        signerName: r.authorName,
        signerRole: r.authorRole,
        meaning: r.meaning,
        signedAt: new Date(r.receivedAt).toISOString(),
        contentSha256,
        valid: sha256(signedDocument(batch, before)) === contentSha256,
      };
    });
}

/**
 * The head brewer signs the brew day with the meaning "reviewed". A wrong password answers 400 and,
 * through the route's limiter, counts toward the sign-in throttle. Afterwards brew-day entries are corrections only.
 */
export async function signOffBrewDay(
  actor: LogActor,
  batchId: number,
  password: string,
  meta: WriteMeta,
): Promise<Signature> {
  const user = await User.findOne({ where: { id: actor.id, breweryId: actor.breweryId } });
  if (!user || !(await checkPassword(password, user.passwordHash))) {
    throw wrongPassword(400, 'Your password is not right. Nothing was signed.', {
      password: 'This is not your password',
    });
  }
  const brewery = await Brewery.findByPk(actor.breweryId);
  return sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, async (transaction) => {
    const batch = await Batch.findOne({
      where: { id: batchId, breweryId: actor.breweryId },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!batch) throw notFound('This batch');
    if (await brewDaySigned(batchId, transaction)) throw signedOff('This brew day is already signed off.');
    const before = await BatchLogEntry.findAll({ where: { batchId }, order: [['sequence', 'ASC']], transaction });
    if (!before.some((e) => BREW_DAY_KINDS.includes(e.kind))) throw conflict('There is nothing logged to sign yet.');
    const entry = await appendLogEntry(
      actor,
      batchId,
      {
        kind: 'sign_off',
        meaning: 'reviewed',
        contentSha256: sha256(signedDocument(batch, before)),
        signedThroughSequence: before.at(-1)!.sequence,
        timeZone: brewery?.timeZone ?? 'UTC',
      },
      meta,
      { transaction },
    );
    return signaturesOf(batch, [...before, entry]).at(-1)!;
  });
}
