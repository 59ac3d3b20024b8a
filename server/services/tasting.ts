/**
 * Tasting notes: each signed by its author (from the session, never the body), append-only, chained by
 * SHA-256 per batch like the batch log. A correction is a new note pointing at the one it corrects.
 */
import { Op, Transaction, UniqueConstraintError } from 'sequelize';
import { sequelize } from '../config/database';
import { TastingNote } from '../models';
import { methodNotAllowed, notFound, unprocessable } from '../errors';
import { canonicalJson, GENESIS_HASH, sha256 } from './batch-log';
import { findBatch } from './batches';
import type {
  OffFlavour,
  TastingNote as TastingNoteView,
  TastingNoteInput,
  TastingSummary,
} from '../../shared/schemas/tasting';

type Hashable = Pick<
  TastingNote,
  | 'breweryId'
  | 'batchId'
  | 'sequence'
  | 'content'
  | 'correctsNoteId'
  | 'reason'
  | 'authorId'
  | 'authorRole'
  | 'authorName'
  | 'signedAt'
  | 'idempotencyKey'
>;

/** SHA-256 over the previous note's hash and exactly what this note records and who signed it when. */
function noteHash(prevHash: string, n: Hashable): string {
  const content = {
    breweryId: Number(n.breweryId),
    batchId: Number(n.batchId),
    sequence: Number(n.sequence),
    content: n.content,
    correctsNoteId: n.correctsNoteId === null ? null : Number(n.correctsNoteId),
    reason: n.reason ?? null,
    authorId: Number(n.authorId),
    authorRole: n.authorRole,
    authorName: n.authorName,
    signedAt: new Date(n.signedAt).toISOString(),
    idempotencyKey: n.idempotencyKey,
  };
  return sha256(`${prevHash}\n${canonicalJson(content)}`);
}

function toView(n: TastingNote, prevHash: string, correctedBy: number[]): TastingNoteView {
  return {
    id: Number(n.id),
    batchId: n.batchId,
    content: n.content,
    correctsNoteId: n.correctsNoteId === null ? null : Number(n.correctsNoteId),
    reason: n.reason,
    correctedBy,
    signature: {
      authorId: n.authorId,
      authorName: n.authorName,
      authorRole: n.authorRole,
      signedAt: new Date(n.signedAt).toISOString(),
      meaning: 'authored',
      contentHash: n.hash,
      valid: n.prevHash === prevHash && n.hash === noteHash(prevHash, n),
    },
  };
}

/** Who reads or signs notes: the signed-in person (their brewery's settings are not needed). */
type NoteAuthor = Omit<Express.User, 'brewery'>;

/** A batch's notes in order, each with its signature checked against the chain. */
export async function listTastingNotes(
  actor: NoteAuthor,
  batchId: number,
  transaction?: Transaction,
): Promise<TastingNoteView[]> {
  await findBatch(actor.breweryId, batchId, transaction);
  const rows = await TastingNote.findAll({
    where: { batchId, breweryId: actor.breweryId },
    order: [['sequence', 'ASC']],
    transaction,
  });
  const correctedBy = new Map<number, number[]>();
  for (const r of rows) {
    if (r.correctsNoteId !== null) {
      const target = Number(r.correctsNoteId);
      correctedBy.set(target, [...(correctedBy.get(target) ?? []), Number(r.id)]);
    }
  }
  let prevHash = GENESIS_HASH;
  return rows.map((r) => {
    const view = toView(r, prevHash, correctedBy.get(Number(r.id)) ?? []);
    prevHash = r.hash;
    return view;
  });
}

async function replayOf(
  actor: NoteAuthor,
  batchId: number,
  input: TastingNoteInput,
  transaction?: Transaction,
): Promise<TastingNote | null> {
  const existing = await TastingNote.findOne({
    where: { breweryId: actor.breweryId, idempotencyKey: input.idempotencyKey },
    transaction,
  });
  if (!existing) return null;
  const same =
    existing.batchId === batchId &&
    existing.authorId === actor.id &&
    canonicalJson(existing.content) === canonicalJson(input.content) &&
    (existing.correctsNoteId === null ? null : Number(existing.correctsNoteId)) === (input.correctsNoteId ?? null);
  if (!same) throw unprocessable('This note’s key was already used for a different note. Nothing was saved.');
  return existing;
}

/** Records one signed note; the same idempotency key with the same note returns the first. */
export async function addTastingNote(
  actor: NoteAuthor,
  batchId: number,
  input: TastingNoteInput,
  transaction?: Transaction,
): Promise<{ note: TastingNoteView; created: boolean }> {
  let result: { row: TastingNote; created: boolean };
  if (transaction) {
    result = await append(actor, batchId, input, transaction);
  } else {
    try {
      result = await sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, (t) =>
        append(actor, batchId, input, t),
      );
    } catch (error) {
      // The same key raced in from a second send: the unique index kept one; answer as a replay would.
      const replay = error instanceof UniqueConstraintError ? await replayOf(actor, batchId, input) : null;
      if (!replay) throw error;
      result = { row: replay, created: false };
    }
  }
  const notes = await listTastingNotes(actor, batchId, transaction);
  return { note: notes.find((n) => n.id === Number(result.row.id))!, created: result.created };
}

async function append(actor: NoteAuthor, batchId: number, input: TastingNoteInput, transaction: Transaction) {
  // Locking the batch row serialises the notes of one batch, so the chain never forks.
  const batch = await findBatch(actor.breweryId, batchId, transaction, true);
  const replay = await replayOf(actor, batch.id, input, transaction);
  if (replay) return { row: replay, created: false };
  if (batch.status === 'planned' || batch.status === 'brewing') {
    throw unprocessable('There is no beer to taste yet: notes start once the batch is fermenting.');
  }
  if (input.correctsNoteId) {
    const target = await TastingNote.findOne({ where: { id: input.correctsNoteId, batchId: batch.id }, transaction });
    if (!target) throw unprocessable('The note to correct is not one of this batch’s notes.');
    if (target.authorId !== actor.id)
      throw unprocessable('Only the taster who signed a note can correct it; add your own note instead.');
  }
  const previous = await TastingNote.findOne({
    where: { batchId: batch.id },
    order: [['sequence', 'DESC']],
    transaction,
  });
  const prevHash = previous?.hash ?? GENESIS_HASH;
  const fields = {
    breweryId: actor.breweryId,
    batchId: batch.id,
    sequence: (previous?.sequence ?? 0) + 1,
    content: input.content,
    score: input.content.score,
    correctsNoteId: input.correctsNoteId ?? null,
    reason: input.reason ?? null,
    authorId: actor.id,
    authorRole: actor.role,
    authorName: actor.displayName,
    signedAt: new Date(),
    idempotencyKey: input.idempotencyKey,
  };
  const row = await TastingNote.create({ ...fields, prevHash, hash: noteHash(prevHash, fields) }, { transaction });
  return { row, created: true };
}

/** Signed notes are never changed or deleted: 404 for a note that is not this brewery's, else 405. */
export async function refuseNoteChange(actor: Express.User, batchId: number, noteId: number): Promise<never> {
  const note = await TastingNote.findOne({ where: { id: noteId, batchId, breweryId: actor.breweryId } });
  if (!note) throw notFound('This tasting note');
  throw methodNotAllowed(
    'Signed tasting notes cannot be changed or deleted. Add a correction that points at the note instead.',
  );
}

/** What the taproom reads: current notes only (a corrected note counts through its correction). */
export async function tastingSummaries(breweryId: number, batchIds: number[]): Promise<Map<number, TastingSummary>> {
  const rows = batchIds.length
    ? await TastingNote.findAll({ where: { breweryId, batchId: { [Op.in]: batchIds } }, order: [['sequence', 'ASC']] })
    : [];
  const corrected = new Set(rows.filter((r) => r.correctsNoteId !== null).map((r) => Number(r.correctsNoteId)));
  const out = new Map<number, TastingSummary>();
  for (const batchId of batchIds) {
    const current = rows.filter((r) => r.batchId === batchId && !corrected.has(Number(r.id)));
    const latest = current.at(-1);
    const offFlavours = new Set<OffFlavour>(current.flatMap((r) => r.content.offFlavours));
    out.set(batchId, {
      tasters: new Set(current.map((r) => r.authorId)).size,
      averageScore: current.length
        ? Math.round((current.reduce((s, r) => s + r.score, 0) / current.length) * 10) / 10
        : null,
      aroma: latest?.content.aroma ?? null,
      flavour: latest?.content.flavour ?? null,
      offFlavours: [...offFlavours],
    });
  }
  return out;
}
