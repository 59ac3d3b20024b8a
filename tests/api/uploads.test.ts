// Photos and lab sheets through the fake S3 server: upload, list, download, the size cap, types from
// the bytes, generated keys, thumbnails, and who may fetch what.
import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { HeadObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { Attachment, AuditEvent } from '../../server/models';
import { createTestBrewery, type TestBrewery } from './helpers';
import { plannedBatch } from './batch-fixtures';
import { SHEET, TASTING_CONTENT } from './taproom-fixtures';
import type { Batch } from '../../server/models';

let t: TestBrewery;
let other: TestBrewery;
let batch: Batch;

/** The fake server itself, asked directly: proves the bytes went through the S3 API. */
const s3 = () =>
  new S3Client({
    endpoint: process.env.S3_ENDPOINT,
    region: process.env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID!, secretAccessKey: process.env.S3_SECRET_ACCESS_KEY! },
  });

const photo = () =>
  sharp({ create: { width: 1600, height: 1200, channels: 3, background: { r: 200, g: 140, b: 40 } } })
    .jpeg({ quality: 85 })
    .toBuffer();
// The smallest well-formed PDF header and trailer; the type is read from the leading "%PDF-" bytes.
const PDF = Buffer.from(
  '%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
);

beforeAll(async () => {
  t = await createTestBrewery();
  other = await createTestBrewery();
  batch = await plannedBatch({ id: t.users.head_brewer.id, breweryId: t.brewery.id });
});

describe('uploading to a batch', () => {
  let photoId: number;
  let sheetId: number;
  let jpeg: Buffer;

  it('stores a photo under a generated key in the object store, with a thumbnail', async () => {
    jpeg = await photo();
    const res = await t.as.assistant_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .attach('file', jpeg, { filename: 'krausen day 3.jpg', contentType: 'image/jpeg' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({
      kind: 'photo',
      contentType: 'image/jpeg',
      byteSize: jpeg.length,
      displayName: 'krausen day 3.jpg',
    });
    photoId = res.body.id;

    const row = await Attachment.findByPk(photoId);
    expect(row!.storageKey).toMatch(new RegExp(`^breweries/${t.brewery.id}/batches/${batch.id}/[0-9a-f-]{36}\\.jpg$`));
    expect(row!.storageKey).not.toContain('krausen');
    const head = await s3().send(new HeadObjectCommand({ Bucket: process.env.S3_BUCKET, Key: row!.storageKey }));
    expect(head.ContentLength).toBe(jpeg.length);
    expect(head.ContentType).toBe('image/jpeg');
    await s3().send(new HeadObjectCommand({ Bucket: process.env.S3_BUCKET, Key: row!.thumbnailKey! }));
  });

  it('stores a PDF lab sheet', async () => {
    const res = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .attach('file', PDF, { filename: 'lab-sheet.pdf', contentType: 'application/pdf' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ kind: 'document', contentType: 'application/pdf', thumbnailUrl: null });
    sheetId = res.body.id;
  });

  it('lists what is attached to the batch', async () => {
    const res = await t.as.head_brewer.get(`/api/batches/${batch.id}/attachments`);
    expect(res.status).toBe(200);
    expect(res.body.map((a: { id: number }) => a.id)).toEqual([photoId, sheetId]);
    expect(res.body[0]).toMatchObject({
      uploadedBy: t.users.assistant_brewer.displayName,
      url: `/api/attachments/${photoId}/file`,
    });
  });

  it('serves the photo inline with its type, and the thumbnail no larger than 480 px', async () => {
    const res = await t.as.head_brewer.get(`/api/attachments/${photoId}/file`).buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('image/jpeg');
    expect(res.headers['content-disposition']).toMatch(/^inline; filename="batch-[\w-]+-file-\d+\.jpg"$/);
    expect(Buffer.compare(res.body as Buffer, jpeg)).toBe(0);

    const thumb = await t.as.assistant_brewer.get(`/api/attachments/${photoId}/thumbnail`).buffer(true);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['webp', 480, 360]);
  });

  it('serves anything but an image as an attachment, under our own file name', async () => {
    const res = await t.as.head_brewer.get(`/api/attachments/${sheetId}/file`).buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="batch-[\w-]+-file-\d+\.pdf"$/);
    expect(res.headers['content-disposition']).not.toContain('lab-sheet');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(res.body as Buffer, PDF)).toBe(0);
  });
});

describe('attaching to a tasting note', () => {
  it("attaches a lab sheet to one of the batch's notes, and refuses a note of another batch", async () => {
    const fermenting = await plannedBatch({ id: t.users.head_brewer.id, breweryId: t.brewery.id });
    await fermenting.update({ status: 'fermenting' });
    const note = await t.as.head_brewer
      .post(`/api/batches/${fermenting.id}/tasting-notes`)
      .send({ idempotencyKey: randomUUID(), content: TASTING_CONTENT });
    expect(note.status).toBe(201);
    const res = await t.as.head_brewer
      .post(`/api/batches/${fermenting.id}/attachments`)
      .field('tastingNoteId', String(note.body.id))
      .attach('file', PDF, { filename: 'lab.pdf', contentType: 'application/pdf' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.tastingNoteId).toBe(note.body.id);
    const wrong = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .field('tastingNoteId', String(note.body.id))
      .attach('file', PDF, { filename: 'lab.pdf', contentType: 'application/pdf' });
    expect(wrong.status).toBe(404);
  });
});

describe('removing a file', () => {
  const upload = (batchId: number, as = t.as.assistant_brewer) =>
    as
      .post(`/api/batches/${batchId}/attachments`)
      .attach('file', PDF, { filename: 'wrong batch.pdf', contentType: 'application/pdf' });

  it('lets the head brewer remove a wrong file: its row and its stored object go', async () => {
    const res = await upload(batch.id);
    expect(res.status).toBe(201);
    const row = await Attachment.findByPk(res.body.id);
    expect((await t.as.assistant_brewer.delete(`/api/attachments/${res.body.id}`)).status).toBe(403);
    expect((await other.as.head_brewer.delete(`/api/attachments/${res.body.id}`)).status).toBe(404);
    expect((await t.as.head_brewer.delete(`/api/attachments/${res.body.id}`)).status).toBe(204);
    expect(
      (await t.as.head_brewer.get(`/api/batches/${batch.id}/attachments`)).body.map((a: { id: number }) => a.id),
    ).not.toContain(res.body.id);
    expect((await t.as.head_brewer.get(`/api/attachments/${res.body.id}/file`)).status).toBe(404);
    await expect(
      s3().send(new HeadObjectCommand({ Bucket: process.env.S3_BUCKET, Key: row!.storageKey })),
    ).rejects.toMatchObject({ name: 'NotFound' });
    const audit = await AuditEvent.findOne({
      where: { action: 'attachment.remove', userId: t.users.head_brewer.id },
      order: [['id', 'DESC']],
    });
    expect(audit?.detail).toEqual({ attachmentId: res.body.id });
  });

  it("keeps a tasting note's file and the release sheet's photo (409)", async () => {
    const fermenting = await plannedBatch({ id: t.users.head_brewer.id, breweryId: t.brewery.id });
    await fermenting.update({ status: 'fermenting' });
    const note = await t.as.head_brewer
      .post(`/api/batches/${fermenting.id}/tasting-notes`)
      .send({ idempotencyKey: randomUUID(), content: TASTING_CONTENT });
    const onNote = await t.as.head_brewer
      .post(`/api/batches/${fermenting.id}/attachments`)
      .field('tastingNoteId', String(note.body.id))
      .attach('file', PDF, { filename: 'lab.pdf', contentType: 'application/pdf' });
    const kept = await t.as.head_brewer.delete(`/api/attachments/${onNote.body.id}`);
    expect(kept.status).toBe(409);
    expect(kept.body.error.message).toMatch(/signed tasting note/);

    const shot = await t.as.head_brewer
      .post(`/api/batches/${fermenting.id}/attachments`)
      .attach('file', await photo(), { filename: 'glass.jpg', contentType: 'image/jpeg' });
    expect(
      (
        await t.as.head_brewer
          .put(`/api/batches/${fermenting.id}/release`)
          .send({ ...SHEET, photoAttachmentId: shot.body.id })
      ).status,
    ).toBe(200);
    const onSheet = await t.as.head_brewer.delete(`/api/attachments/${shot.body.id}`);
    expect(onSheet.status).toBe(409);
    expect(onSheet.body.error.message).toMatch(/release sheet/);
    expect(await Attachment.count({ where: { id: [onNote.body.id, shot.body.id] } })).toBe(2);
  });
});

describe('refusing uploads', () => {
  it('answers 413 to a file over 15 MB, and stores nothing', async () => {
    const before = await Attachment.count({ where: { batchId: batch.id } });
    const big = Buffer.alloc(15 * 1024 * 1024 + 1, 0xff);
    const res = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .attach('file', big, { filename: 'huge.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/at most 15 MB/);
    expect(await Attachment.count({ where: { batchId: batch.id } })).toBe(before);
  });

  it('refuses an HTML file named .png: the type comes from the bytes', async () => {
    const html = Buffer.from('<!doctype html><html><body><script>alert(document.cookie)</script></body></html>');
    const res = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .attach('file', html, { filename: 'photo.png', contentType: 'image/png' });
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/JPEG, PNG or WebP\) or a PDF/);
  });

  it('refuses a type outside the list even when the bytes are honest (a GIF)', async () => {
    const gif = await sharp({ create: { width: 4, height: 4, channels: 3, background: '#000' } })
      .gif()
      .toBuffer();
    const res = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .attach('file', gif, { filename: 'a.gif', contentType: 'image/gif' });
    expect(res.status).toBe(415);
  });

  it('refuses a request with no file, or an empty one, with a clear message', async () => {
    const none = await t.as.head_brewer.post(`/api/batches/${batch.id}/attachments`).send({});
    expect(none.status).toBe(400);
    expect(none.body.error.message).toMatch(/Choose a file/);
    const empty = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .attach('file', Buffer.alloc(0), { filename: 'empty.png', contentType: 'image/png' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toMatch(/empty/);
  });

  it('refuses a damaged picture whose first bytes look right', async () => {
    const broken = Buffer.concat([(await photo()).subarray(0, 200)]);
    const res = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .attach('file', broken, { filename: 'cut.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/could not be read/);
  });
});

describe('who may fetch files', () => {
  let id: number;
  beforeAll(async () => {
    id = (await Attachment.findOne({ where: { batchId: batch.id, kind: 'photo' } }))!.id;
  });

  it("answers 404 to another brewery's people, for the file, the thumbnail and the batch's list", async () => {
    expect((await other.as.head_brewer.get(`/api/attachments/${id}/file`)).status).toBe(404);
    expect((await other.as.head_brewer.get(`/api/attachments/${id}/thumbnail`)).status).toBe(404);
    expect((await other.as.head_brewer.get(`/api/batches/${batch.id}/attachments`)).status).toBe(404);
    const upload = await other.as.head_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .attach('file', await photo(), 'x.jpg');
    expect(upload.status).toBe(404);
  });

  it('answers 401 when signed out', async () => {
    const { agent } = await import('./helpers');
    expect((await agent().get(`/api/attachments/${id}/file`)).status).toBe(401);
  });

  it('keeps batch files from the taproom until the photo is on an announced beer', async () => {
    expect((await t.as.taproom_manager.get(`/api/batches/${batch.id}/attachments`)).status).toBe(403);
    expect((await t.as.taproom_manager.get(`/api/attachments/${id}/file`)).status).toBe(404);
    expect(
      (await t.as.taproom_manager.post(`/api/batches/${batch.id}/attachments`).attach('file', PDF, 'x.pdf')).status,
    ).toBe(403);
  });
});
