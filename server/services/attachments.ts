// Photos and lab sheets on batches: the type comes from the bytes, the key from us, the bytes go to object storage.
import { randomUUID } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import multer from 'multer';
import type { RequestHandler } from 'express';
import { Op } from 'sequelize';
import { Attachment, Batch, Release, TastingNote, User } from '../models';
import type { AttachmentKind } from '../models/attachment';
import { badRequest, conflict, HttpError, notFound, tooLarge } from '../errors';
import { deleteObject, getObject, putObject } from './storage';
import { UPLOAD_MAX_BYTES, type AttachmentView } from '../../shared/schemas/taproom';
import { findBatch } from './batches';
import { can } from '../../shared/policy';
import { logger } from '../logger';

const THUMBNAIL_PX = 480;
/** Refuse pictures larger than this (pixels) before decoding: a small file can unpack to gigabytes. */
const MAX_INPUT_PIXELS = 100_000_000;

/** Types accepted, as detected from the file's bytes (never from its name or the browser's claim). */
const ACCEPTED: Record<string, { kind: AttachmentKind; extension: string }> = {
  'application/pdf': { kind: 'document', extension: 'pdf' },
  'image/jpeg': { kind: 'photo', extension: 'jpg' },
  'image/png': { kind: 'photo', extension: 'png' },
  'image/webp': { kind: 'photo', extension: 'webp' },
};

const unsupported = () =>
  new HttpError('unsupported_type', 'Attach a photo (JPEG, PNG or WebP) or a PDF. This file is none of those.');

const parser = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: UPLOAD_MAX_BYTES, files: 1, fields: 5 },
}).single('file');

/** Reads one multipart file into memory, refusing anything over the cap with 413 before it is all buffered. */
export const receiveFile: RequestHandler = (req, res, next) => {
  parser(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE')
        return next(tooLarge(`Files can be at most ${UPLOAD_MAX_BYTES / 1024 / 1024} MB.`));
      return next(badRequest('Send one file in the field named "file".'));
    }
    next(badRequest('The upload could not be read. Try again.'));
  });
};

export function attachmentView(a: Attachment, uploadedBy: string): AttachmentView {
  return {
    id: a.id,
    kind: a.kind,
    contentType: a.contentType,
    byteSize: a.byteSize,
    displayName: a.displayName,
    tastingNoteId: a.tastingNoteId === null ? null : Number(a.tastingNoteId),
    uploadedBy,
    createdAt: a.createdAt.toISOString(),
    url: `/api/attachments/${a.id}/file`,
    thumbnailUrl: a.thumbnailKey ? `/api/attachments/${a.id}/thumbnail` : null,
  };
}

/** A file name fit for a list: no path, no control characters. */
function cleanName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  const clean = base
    // Control characters are exactly what this strips.
    // eslint-disable-next-line no-control-regex
    .replace(/[\u0000-\u001f\u007f]/g, '')
    .trim()
    .slice(0, 200);
  return clean || 'Untitled';
}

export async function uploadAttachment(
  actor: Express.User,
  batchId: number,
  file: Express.Multer.File | undefined,
  tastingNoteId: number | undefined,
): Promise<AttachmentView> {
  const batch = await findBatch(actor.breweryId, batchId);
  if (!file) throw badRequest('Choose a file to attach.', { file: 'Choose a file to attach' });
  if (file.size === 0) throw badRequest('This file is empty.', { file: 'This file is empty' });
  if (tastingNoteId !== undefined) {
    const note = await TastingNote.findOne({
      where: { id: tastingNoteId, batchId: batch.id, breweryId: actor.breweryId },
    });
    if (!note) throw notFound('This tasting note');
  }
  const detected = await fileTypeFromBuffer(file.buffer);
  const accepted = detected && ACCEPTED[detected.mime];
  if (!detected || !accepted) throw unsupported();

  const key = `breweries/${actor.breweryId}/batches/${batch.id}/${randomUUID()}.${accepted.extension}`;
  let thumbnailKey: string | null = null;
  let thumbnail: Buffer | null = null;
  if (accepted.kind === 'photo') {
    try {
      thumbnail = await sharp(file.buffer, { limitInputPixels: MAX_INPUT_PIXELS })
        .rotate()
        .resize(THUMBNAIL_PX, THUMBNAIL_PX, { fit: 'inside', withoutEnlargement: true })
        .webp({ quality: 80 })
        .toBuffer();
    } catch {
      throw badRequest(
        'This picture could not be read: it may be damaged or over 100 megapixels. Try exporting it again.',
        { file: 'Unreadable picture' },
      );
    }
    thumbnailKey = key.replace(/\.\w+$/, '.thumb.webp');
  }
  await putObject(key, file.buffer, detected.mime);
  if (thumbnail && thumbnailKey) await putObject(thumbnailKey, thumbnail, 'image/webp');

  const attachment = await Attachment.create({
    breweryId: actor.breweryId,
    batchId: batch.id,
    tastingNoteId: tastingNoteId ?? null,
    kind: accepted.kind,
    contentType: detected.mime,
    byteSize: file.size,
    storageKey: key,
    thumbnailKey,
    displayName: cleanName(file.originalname),
    uploadedById: actor.id,
  });
  return attachmentView(attachment, actor.displayName);
}

export async function listAttachments(actor: Express.User, batchId: number): Promise<AttachmentView[]> {
  const batch = await findBatch(actor.breweryId, batchId);
  const rows = await Attachment.findAll({
    where: { breweryId: actor.breweryId, batchId: batch.id },
    order: [['id', 'ASC']],
  });
  const people = await User.findAll({ where: { id: { [Op.in]: [...new Set(rows.map((r) => r.uploadedById))] } } });
  const names = new Map(people.map((p) => [p.id, p.displayName]));
  return rows.map((r) => attachmentView(r, names.get(r.uploadedById) ?? 'Unknown'));
}

/**
 * Finds an attachment the person may fetch: their brewery's only (another brewery's answers 404).
 * Whoever may not read the batch's files (the taproom) sees a photo only once it is on an announced or released beer.
 */
async function readableAttachment(actor: Express.User, id: number): Promise<Attachment> {
  const attachment = await Attachment.findOne({ where: { id, breweryId: actor.breweryId } });
  if (!attachment) throw notFound('This file');
  if (!can(actor.role, 'file.read')) {
    const shown = await Release.count({
      where: { breweryId: actor.breweryId, photoAttachmentId: attachment.id, state: { [Op.ne]: 'draft' } },
    });
    if (!shown) throw notFound('This file');
  }
  return attachment;
}

export interface FileDownload {
  body: Buffer;
  contentType: string;
  disposition: string;
}

export async function downloadAttachment(
  actor: Express.User,
  id: number,
  variant: 'file' | 'thumbnail',
): Promise<FileDownload> {
  const attachment = await readableAttachment(actor, id);
  if (variant === 'thumbnail') {
    if (!attachment.thumbnailKey) throw notFound('A thumbnail of this file');
    return { body: await getObject(attachment.thumbnailKey), contentType: 'image/webp', disposition: 'inline' };
  }
  const batch = await Batch.findByPk(attachment.batchId, { attributes: ['number'] });
  const extension = ACCEPTED[attachment.contentType]?.extension ?? 'bin';
  // Our own name for the download: the client's name never goes into a header.
  const filename = `batch-${batch?.number ?? attachment.batchId}-file-${attachment.id}.${extension}`.replace(
    /[^A-Za-z0-9._-]/g,
    '-',
  );
  const disposition =
    attachment.kind === 'photo' ? `inline; filename="${filename}"` : `attachment; filename="${filename}"`;
  return { body: await getObject(attachment.storageKey), contentType: attachment.contentType, disposition };
}

/**
 * Removes a file put on the wrong batch or taken badly. A file that is part of a signed tasting note, or the
 * photo of a release sheet, stays (409): the note is a signed record, and the sheet must change photo first.
 * The row goes first; an object whose deletion fails is only logged, as an orphan loses nothing.
 */
export async function removeAttachment(actor: Express.User, id: number): Promise<void> {
  const attachment = await Attachment.findOne({ where: { id, breweryId: actor.breweryId } });
  if (!attachment) throw notFound('This file');
  if (attachment.tastingNoteId !== null)
    throw conflict('This file belongs to a signed tasting note, so it stays with the note.');
  if (await Release.count({ where: { breweryId: actor.breweryId, photoAttachmentId: attachment.id } })) {
    throw conflict('This photo is on the release sheet: choose another photo there first.');
  }
  await attachment.destroy();
  for (const key of [attachment.storageKey, attachment.thumbnailKey]) {
    if (key) await deleteObject(key).catch((err: unknown) => logger.error({ err, key }, 'stored file was not deleted'));
  }
}
