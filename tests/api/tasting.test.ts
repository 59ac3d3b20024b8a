// Tasting notes: structured, signed by their author from the session, append-only like log entries,
// corrections as new notes, several tasters per batch, idempotent sends, tampering shown.
import { randomUUID } from 'node:crypto';
import { Sequelize, QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '../../server/config/database';
import { TastingNote } from '../../server/models';
import { createTestBrewery, type TestBrewery } from './helpers';
import { plannedBatch } from './batch-fixtures';
import { brewedBatch, TASTING_CONTENT } from './taproom-fixtures';
import type { Batch } from '../../server/models';

let t: TestBrewery;
let other: TestBrewery;
let batch: Batch;
const owner = new Sequelize(process.env.KW_OWNER_DATABASE_URL!.replace(/^mysql:/, 'mariadb:'), {
  dialect: 'mariadb',
  logging: false,
});

const content = (overrides: Record<string, unknown> = {}) => ({ ...TASTING_CONTENT, ...overrides });
const note = (overrides: Record<string, unknown> = {}) => ({
  idempotencyKey: randomUUID(),
  content: content(),
  ...overrides,
});

beforeAll(async () => {
  t = await createTestBrewery();
  other = await createTestBrewery();
  batch = await brewedBatch(t, { og: 1.058, readings: [1.02] });
});
afterAll(async () => {
  await owner.close();
});

describe('a signed tasting note', () => {
  let first: { id: number; signature: { contentHash: string } };

  it('is signed by its author from the session, with the server’s time', async () => {
    const res = await t.as.assistant_brewer
      .post(`/api/batches/${batch.id}/tasting-notes`)
      .send(note({ content: content({ offFlavours: ['diacetyl'] }) }));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.signature).toMatchObject({
      authorId: t.users.assistant_brewer.id,
      authorName: t.users.assistant_brewer.displayName,
      authorRole: 'assistant_brewer',
      meaning: 'authored',
      valid: true,
    });
    expect(res.body.signature.contentHash).toMatch(/^[0-9a-f]{64}$/);
    expect(Math.abs(Date.parse(res.body.signature.signedAt) - Date.now())).toBeLessThan(60_000);
    expect(res.body.content.offFlavours).toEqual(['diacetyl']);
    first = res.body;
  });

  it('refuses a body that names an author or a signing time', async () => {
    for (const extra of [
      { authorId: t.users.head_brewer.id },
      { signedAt: new Date().toISOString() },
      { authorName: 'Someone else' },
    ]) {
      const res = await t.as.assistant_brewer
        .post(`/api/batches/${batch.id}/tasting-notes`)
        .send({ ...note(), ...extra });
      expect(res.status).toBe(400);
      expect(res.body.error.fields._).toMatch(/Unknown field/);
    }
  });

  it('takes off-flavours from the list only, and a score from 1 to 5 in half points', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ offFlavours: ['tastes odd'] }, 'content.offFlavours.0'],
      [{ offFlavours: ['dms', 'dms'] }, 'content.offFlavours'],
      [{ score: 5.5 }, 'content.score'],
      [{ score: 3.25 }, 'content.score'],
      [{ appearance: { colour: 'gold', clarity: 'murky-ish', head: 'good' } }, 'content.appearance.clarity'],
    ];
    for (const [bad, field] of cases) {
      const res = await t.as.head_brewer
        .post(`/api/batches/${batch.id}/tasting-notes`)
        .send(note({ content: content(bad) }));
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields)).toContain(field);
    }
  });

  it('cannot be changed or deleted through the API (405)', async () => {
    const patch = await t.as.assistant_brewer
      .patch(`/api/batches/${batch.id}/tasting-notes/${first.id}`)
      .send({ score: 5 });
    expect(patch.status).toBe(405);
    const del = await t.as.head_brewer.delete(`/api/batches/${batch.id}/tasting-notes/${first.id}`);
    expect(del.status).toBe(405);
    expect(del.body.error.message).toMatch(/Add a correction/);
  });

  it('cannot be changed or deleted by the application’s own database account', async () => {
    await expect(
      sequelize.query('UPDATE tasting_notes SET score = 5 WHERE id = ?', {
        replacements: [first.id],
        type: QueryTypes.UPDATE,
      }),
    ).rejects.toThrow(/command denied/i);
    await expect(
      sequelize.query('DELETE FROM tasting_notes WHERE id = ?', { replacements: [first.id], type: QueryTypes.DELETE }),
    ).rejects.toThrow(/command denied/i);
    expect(Number((await TastingNote.findByPk(first.id))!.score)).toBe(4);
  });

  it('is corrected by a new note from the same taster that points at it and says why', async () => {
    const noReason = await t.as.assistant_brewer
      .post(`/api/batches/${batch.id}/tasting-notes`)
      .send(note({ correctsNoteId: first.id }));
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toMatch(/Say why/);

    const byOther = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/tasting-notes`)
      .send(note({ correctsNoteId: first.id, reason: 'I disagree' }));
    expect(byOther.status).toBe(422);

    const fix = await t.as.assistant_brewer.post(`/api/batches/${batch.id}/tasting-notes`).send(
      note({
        content: content({ score: 4.5 }),
        correctsNoteId: first.id,
        reason: 'Diacetyl was gone after the sample warmed',
      }),
    );
    expect(fix.status).toBe(201);
    expect(fix.body).toMatchObject({ correctsNoteId: first.id, reason: 'Diacetyl was gone after the sample warmed' });

    const list = (await t.as.head_brewer.get(`/api/batches/${batch.id}/tasting-notes`)).body as {
      id: number;
      correctedBy: number[];
      content: { score: number };
    }[];
    const original = list.find((n) => n.id === first.id)!;
    expect(original.content.score).toBe(4);
    expect(original.correctedBy).toEqual([fix.body.id]);
  });

  it('records several tasters on one batch, each under their own name', async () => {
    const res = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/tasting-notes`)
      .send(note({ content: content({ score: 3.5 }) }));
    expect(res.status).toBe(201);
    const list = (await t.as.assistant_brewer.get(`/api/batches/${batch.id}/tasting-notes`)).body as {
      signature: { authorName: string; valid: boolean };
    }[];
    expect(new Set(list.map((n) => n.signature.authorName))).toEqual(
      new Set([t.users.assistant_brewer.displayName, t.users.head_brewer.displayName]),
    );
    expect(list.every((n) => n.signature.valid)).toBe(true);
  });

  it('shows a note as invalid when its row is altered in the database', async () => {
    const victim = (await TastingNote.findOne({ where: { batchId: batch.id }, order: [['sequence', 'ASC']] }))!;
    await owner.query(
      `UPDATE tasting_notes SET content = JSON_SET(content, '$.aroma', 'Nothing wrong here') WHERE id = ?`,
      {
        replacements: [victim.id],
        type: QueryTypes.UPDATE,
      },
    );
    const list = (await t.as.head_brewer.get(`/api/batches/${batch.id}/tasting-notes`)).body as {
      id: number;
      signature: { valid: boolean };
    }[];
    expect(list.find((n) => n.id === Number(victim.id))!.signature.valid).toBe(false);
    expect(list.filter((n) => n.id !== Number(victim.id)).every((n) => n.signature.valid)).toBe(true);
  });
});

describe('sending the same note twice', () => {
  it('records it once, however the two sends interleave', async () => {
    const fresh = await brewedBatch(t, { og: 1.05, readings: [] });
    const body = note();
    const [a, b] = await Promise.all([
      t.as.head_brewer.post(`/api/batches/${fresh.id}/tasting-notes`).send(body),
      t.as.head_brewer.post(`/api/batches/${fresh.id}/tasting-notes`).send(body),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect(await TastingNote.count({ where: { batchId: fresh.id } })).toBe(1);
    const again = await t.as.head_brewer.post(`/api/batches/${fresh.id}/tasting-notes`).send(body);
    expect([again.status, again.body.id]).toEqual([200, a.body.id]);
  });

  it('refuses the same key with a different note (422)', async () => {
    const body = note();
    expect((await t.as.head_brewer.post(`/api/batches/${batch.id}/tasting-notes`).send(body)).status).toBe(201);
    const res = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/tasting-notes`)
      .send({ ...body, content: content({ score: 2 }) });
    expect(res.status).toBe(422);
  });
});

describe('who may taste what', () => {
  it('refuses a note before there is beer (a planned batch)', async () => {
    const planned = await plannedBatch({ id: t.users.head_brewer.id, breweryId: t.brewery.id });
    const res = await t.as.head_brewer.post(`/api/batches/${planned.id}/tasting-notes`).send(note());
    expect(res.status).toBe(422);
  });

  it('keeps notes from the taproom manager (403) and from another brewery (404)', async () => {
    expect((await t.as.taproom_manager.get(`/api/batches/${batch.id}/tasting-notes`)).status).toBe(403);
    expect((await t.as.taproom_manager.post(`/api/batches/${batch.id}/tasting-notes`).send(note())).status).toBe(403);
    expect((await other.as.head_brewer.get(`/api/batches/${batch.id}/tasting-notes`)).status).toBe(404);
    expect((await other.as.head_brewer.post(`/api/batches/${batch.id}/tasting-notes`).send(note())).status).toBe(404);
  });
});
