// Batch log: append-only signed entries, the hash chain, idempotency, corrections, sign-off and role rules.
import { randomUUID } from 'node:crypto';
import { Sequelize, QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '../../server/config/database';
import { AuditEvent, BatchLogEntry, IdempotencyKey, Vessel } from '../../server/models';
import { agent, createTestBrewery, GOOD_PASSWORD, headerOf, type TestBrewery } from './helpers';
import { createApp } from '../../server/app';
import { plannedBatch, writeHeaders } from './batch-fixtures';
import type { Batch } from '../../server/models';

let t: TestBrewery;
let other: TestBrewery;
let batch: Batch;
const owner = new Sequelize(process.env.KW_OWNER_DATABASE_URL!.replace(/^mysql:/, 'mariadb:'), {
  dialect: 'mariadb',
  logging: false,
});

const step = (stepKey: string, measurements?: Record<string, number>) => ({
  kind: 'step',
  stepKey,
  label: stepKey,
  ...(measurements ? { measurements } : {}),
});
const actorOf = (u: TestBrewery['users']['head_brewer']) => ({ id: u.id, breweryId: u.breweryId });

beforeAll(async () => {
  t = await createTestBrewery();
  other = await createTestBrewery();
  batch = await plannedBatch(actorOf(t.users.head_brewer));
});
afterAll(async () => {
  await owner.close();
});

describe('logging the brew day', () => {
  it('records author, role and received time from the server, captured time and device from the tablet', async () => {
    const capturedAt = new Date(Date.now() - 60_000);
    const res = await t.as.assistant_brewer
      .post(`/api/batches/${batch.id}/log`)
      .set(writeHeaders({ capturedAt, deviceId: 'tablet-brewhouse-1' }))
      .send(step('strike-water', { tempC: 74.5, volumeL: 24 }));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      kind: 'step',
      stepKey: 'strike-water',
      authorId: t.users.assistant_brewer.id,
      authorRole: 'assistant_brewer',
      authorName: t.users.assistant_brewer.displayName,
      meaning: 'performed',
      capturedAt: capturedAt.toISOString(),
      deviceId: 'tablet-brewhouse-1',
      late: false,
      sequence: 1,
    });
    expect(Math.abs(Date.parse(res.body.receivedAt) - Date.now())).toBeLessThan(60_000);
    expect(res.body.data.measurements).toEqual({ tempC: 74.5, volumeL: 24 });
    // The first step starts the brew.
    expect((await t.as.head_brewer.get(`/api/batches/${batch.id}`)).body.status).toBe('brewing');
    // Written with its audit row and its idempotency record.
    expect(await AuditEvent.count({ where: { action: 'batch-log.append', userId: t.users.assistant_brewer.id } })).toBe(
      1,
    );
    expect(await IdempotencyKey.count({ where: { breweryId: t.brewery.id, resultId: res.body.id } })).toBe(1);
  });

  it('refuses a body that tries to set the author or the received time', async () => {
    for (const extra of [
      { authorId: t.users.head_brewer.id },
      { receivedAt: new Date().toISOString() },
      { authorRole: 'head_brewer' },
    ]) {
      const res = await t.as.assistant_brewer
        .post(`/api/batches/${batch.id}/log`)
        .set(writeHeaders())
        .send({ ...step('mash-in'), ...extra });
      expect(res.status).toBe(400);
      expect(res.body.error.fields._).toMatch(/Unknown field/);
    }
  });

  it('refuses a write without its device details, and measurements out of range, with field messages', async () => {
    const bare = await t.as.assistant_brewer.post(`/api/batches/${batch.id}/log`).send(step('mash-in'));
    expect(bare.status).toBe(400);
    expect(Object.keys(bare.body.error.fields)).toEqual(
      expect.arrayContaining(['idempotencyKey', 'capturedAt', 'deviceId']),
    );
    const hot = await t.as.assistant_brewer
      .post(`/api/batches/${batch.id}/log`)
      .set(writeHeaders())
      .send(step('mash-in', { tempC: 400 }));
    expect(hot.status).toBe(400);
    // The demo brewery is a US one: 110 °C is said as 230 °F (NIST SP 811 §B.9).
    expect(hot.body.error.fields['measurements.tempC']).toBe('Temperature must be at most 230 °F');
  });

  it('flags an entry that reaches the server more than 15 minutes after capture as late', async () => {
    const res = await t.as.assistant_brewer
      .post(`/api/batches/${batch.id}/log`)
      .set(writeHeaders({ capturedAt: new Date(Date.now() - 16 * 60_000) }))
      .send({ kind: 'note', text: 'Stuck sparge, added rice hulls', deviation: true });
    expect(res.status).toBe(201);
    expect(res.body.late).toBe(true);
  });
});

describe('entries are never changed', () => {
  it('answers PATCH, PUT and DELETE on an entry with 405 and leaves it as it was', async () => {
    const entry = await BatchLogEntry.findOne({ where: { batchId: batch.id, sequence: 1 } });
    for (const method of ['patch', 'put', 'delete'] as const) {
      const res = await t.as.head_brewer[method](`/api/batches/${batch.id}/log/${entry!.id}`).send({
        data: { measurements: { tempC: 60 } },
      });
      expect(res.status).toBe(405);
      expect(res.body.error.message).toMatch(/correction/);
    }
    const after = await BatchLogEntry.findByPk(entry!.id);
    expect(after!.hash).toBe(entry!.hash);
  });

  it('the application database account cannot UPDATE or DELETE log entries (INSERT and SELECT only)', async () => {
    await expect(
      sequelize.query('UPDATE batch_log_entries SET reason = ? WHERE batch_id = ?', {
        replacements: ['tampered', batch.id],
        type: QueryTypes.UPDATE,
      }),
    ).rejects.toThrow(/UPDATE command denied/);
    await expect(
      sequelize.query('DELETE FROM batch_log_entries WHERE batch_id = ?', {
        replacements: [batch.id],
        type: QueryTypes.DELETE,
      }),
    ).rejects.toThrow(/DELETE command denied/);
    await expect(
      sequelize.query('DELETE FROM idempotency_keys WHERE brewery_id = ?', {
        replacements: [t.brewery.id],
        type: QueryTypes.DELETE,
      }),
    ).rejects.toThrow(/DELETE command denied/);
  });
});

describe('reading the log', () => {
  it('answers the entries as the batch page shows them; the next answer after an append carries the new entry', async () => {
    const b = await plannedBatch(actorOf(t.users.head_brewer));
    expect((await t.as.head_brewer.get(`/api/batches/${b.id}/log`)).body).toEqual([]);
    const first = await t.as.assistant_brewer
      .post(`/api/batches/${b.id}/log`)
      .set(writeHeaders())
      .send(step('mash-in', { tempC: 67 }));
    await t.as.assistant_brewer
      .post(`/api/batches/${b.id}/log`)
      .set(writeHeaders())
      .send({ kind: 'note', text: 'Grain bed settled “nicely” — ünïcode' });
    const log = await t.as.head_brewer.get(`/api/batches/${b.id}/log`);
    expect(log.status).toBe(200);
    expect(log.body.map((e: { sequence: number }) => e.sequence)).toEqual([1, 2]);
    expect(log.body).toEqual((await t.as.head_brewer.get(`/api/batches/${b.id}`)).body.entries);
    // Unchanged since: the tag still matches.
    const etag = headerOf(log, 'etag');
    expect((await t.as.head_brewer.get(`/api/batches/${b.id}/log`).set('If-None-Match', etag)).status).toBe(304);

    const correction = await t.as.head_brewer
      .post(`/api/batches/${b.id}/log`)
      .set(writeHeaders())
      .send({
        kind: 'correction',
        correctsEntryId: first.body.id,
        reason: 'Probe was in the foundation water',
        measurements: { tempC: 66 },
      });
    const after = await t.as.head_brewer.get(`/api/batches/${b.id}/log`).set('If-None-Match', etag);
    expect(after.status).toBe(200);
    expect(after.body.map((e: { id: number }) => e.id)).toEqual([
      ...log.body.map((e: { id: number }) => e.id),
      correction.body.id,
    ]);
    expect(after.body[0].correctedByIds).toEqual([correction.body.id]);
    expect(after.body).toEqual((await t.as.head_brewer.get(`/api/batches/${b.id}`)).body.entries);
  });
});

describe('the database keeps each entry with its records', () => {
  const insertEntry = (b: Batch, key: string) =>
    owner.query(
      `INSERT INTO batch_log_entries (brewery_id, batch_id, sequence, kind, data, author_id, author_role, author_name, meaning,
         captured_at, received_at, device_id, late, idempotency_key, request_hash, prev_hash, hash)
       VALUES (?, ?, 1, 'note', '{"text":"written without the app"}', ?, 'head_brewer', 'Test', 'performed', NOW(3), NOW(3), 'test', 0, ?, ?, ?, ?)`,
      {
        replacements: [b.breweryId, b.id, t.users.head_brewer.id, key, 'a'.repeat(64), '0'.repeat(64), 'b'.repeat(64)],
        type: QueryTypes.INSERT,
      },
    );

  it('writes the idempotency record and the audit row in the same statement as the entry', async () => {
    const b = await plannedBatch(actorOf(t.users.head_brewer));
    const key = randomUUID();
    const [entryId] = await insertEntry(b, key);
    const record = await IdempotencyKey.findOne({ where: { breweryId: t.brewery.id, key } });
    expect(record).toMatchObject({ scope: 'batch-log', requestHash: 'a'.repeat(64), resultId: entryId });
    const audits = await AuditEvent.findAll({
      where: { action: 'batch-log.append', breweryId: t.brewery.id, userId: t.users.head_brewer.id },
    });
    expect(audits.map((a) => a.detail)).toContainEqual({ batchId: b.id, entryId, kind: 'note' });
  });

  it('writes no entry when its idempotency record cannot be written', async () => {
    const used = await t.as.assistant_brewer
      .post(`/api/batches/${batch.id}/log`)
      .set(writeHeaders())
      .send({ kind: 'note', text: 'key in use' });
    const b = await plannedBatch(actorOf(t.users.head_brewer));
    await expect(insertEntry(b, (await BatchLogEntry.findByPk(used.body.id))!.idempotencyKey)).rejects.toMatchObject({
      name: 'SequelizeUniqueConstraintError',
      parent: { sqlMessage: expect.stringMatching(/Duplicate entry .* for key 'idempotency_keys_brewery_id_key'/) },
    });
    expect(await BatchLogEntry.count({ where: { batchId: b.id } })).toBe(0);
  });
});

describe('corrections', () => {
  it('a correction is a new entry pointing at the original, with a reason; both stay in the log', async () => {
    const original = await t.as.assistant_brewer
      .post(`/api/batches/${batch.id}/log`)
      .set(writeHeaders())
      .send(step('mash-in', { tempC: 76 }));
    const correction = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/log`)
      .set(writeHeaders())
      .send({
        kind: 'correction',
        correctsEntryId: original.body.id,
        reason: 'Read the HLT probe, not the mash',
        measurements: { tempC: 66.5 },
      });
    expect(correction.status).toBe(201);
    expect(correction.body).toMatchObject({
      correctsEntryId: original.body.id,
      reason: 'Read the HLT probe, not the mash',
      authorRole: 'head_brewer',
    });
    const detail = (await t.as.assistant_brewer.get(`/api/batches/${batch.id}`)).body;
    const shownOriginal = detail.entries.find((e: { id: number }) => e.id === original.body.id);
    expect(shownOriginal.data.measurements.tempC).toBe(76);
    expect(shownOriginal.correctedByIds).toEqual([correction.body.id]);
    // Planned vs actual uses the corrected value.
    expect(detail.actuals.mashTempC.actual).toBe(66.5);
    // A correction of an entry in another batch is refused.
    const stranger = await plannedBatch(actorOf(t.users.head_brewer));
    const wrong = await t.as.head_brewer
      .post(`/api/batches/${stranger.id}/log`)
      .set(writeHeaders())
      .send({
        kind: 'correction',
        correctsEntryId: original.body.id,
        reason: 'wrong batch',
        measurements: { tempC: 60 },
      });
    expect(wrong.status).toBe(422);
  });
});

describe('tamper evidence', () => {
  it('the verifier passes an untouched chain and names the first row altered directly in MariaDB', async () => {
    const b = await plannedBatch(actorOf(t.users.head_brewer));
    const ids: number[] = [];
    for (const [i, key] of ['strike-water', 'mash-in', 'recirculate', 'sparge-start'].entries()) {
      const res = await t.as.assistant_brewer
        .post(`/api/batches/${b.id}/log`)
        .set(writeHeaders())
        .send(step(key, { tempC: 60 + i }));
      ids.push(res.body.id);
    }
    const clean = await t.as.head_brewer.get(`/api/batches/${b.id}/log/verify`);
    expect(clean.body).toEqual({ ok: true, checked: 4, firstBad: null });

    // Through the owner account (the app's account could not do this), change the third entry's temperature.
    await owner.query(`UPDATE batch_log_entries SET data = JSON_SET(data, '$.measurements.tempC', 99) WHERE id = ?`, {
      replacements: [ids[2]],
      type: QueryTypes.UPDATE,
    });
    const tampered = await t.as.head_brewer.get(`/api/batches/${b.id}/log/verify`);
    expect(tampered.body.ok).toBe(false);
    expect(tampered.body.firstBad).toMatchObject({
      entryId: ids[2],
      sequence: 3,
      problem: expect.stringMatching(/content/),
    });
  });
});

describe('idempotency', () => {
  it('the same key sent twice at once creates one entry and both answers carry it', async () => {
    const b = await plannedBatch(actorOf(t.users.head_brewer));
    const headers = writeHeaders();
    const body = step('strike-water', { tempC: 75 });
    const [a, c] = await Promise.all([
      t.as.assistant_brewer.post(`/api/batches/${b.id}/log`).set(headers).send(body),
      t.as.assistant_brewer.post(`/api/batches/${b.id}/log`).set(headers).send(body),
    ]);
    expect([a.status, c.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(c.body.id);
    expect(await BatchLogEntry.count({ where: { batchId: b.id } })).toBe(1);
    // Sent again later: still the first result.
    const again = await t.as.assistant_brewer.post(`/api/batches/${b.id}/log`).set(headers).send(body);
    expect(again.body.id).toBe(a.body.id);
  });

  it('the same key with a different body answers 422 and saves nothing', async () => {
    const b = await plannedBatch(actorOf(t.users.head_brewer));
    const headers = writeHeaders();
    await t.as.assistant_brewer
      .post(`/api/batches/${b.id}/log`)
      .set(headers)
      .send(step('mash-in', { tempC: 66 }));
    const res = await t.as.assistant_brewer
      .post(`/api/batches/${b.id}/log`)
      .set(headers)
      .send(step('mash-in', { tempC: 67 }));
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/already used/);
    expect(await BatchLogEntry.count({ where: { batchId: b.id } })).toBe(1);
  });
});

describe('sign-off', () => {
  it('needs the head brewer’s password; afterwards brew-day entries are corrections only; a changed record shows the signature invalid', async () => {
    const b = await plannedBatch(actorOf(t.users.head_brewer));
    const logged = await t.as.assistant_brewer
      .post(`/api/batches/${b.id}/log`)
      .set(writeHeaders())
      .send(step('knockout-end', { gravitySg: 1.061, volumeL: 38 }));

    const assistant = await t.as.assistant_brewer
      .post(`/api/batches/${b.id}/sign-off`)
      .set(writeHeaders())
      .send({ password: GOOD_PASSWORD });
    expect(assistant.status).toBe(403);
    const missing = await t.as.head_brewer.post(`/api/batches/${b.id}/sign-off`).set(writeHeaders()).send({});
    expect(missing.status).toBe(400);
    const wrong = await t.as.head_brewer
      .post(`/api/batches/${b.id}/sign-off`)
      .set(writeHeaders())
      .send({ password: 'not-my-password-9' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.password).toBeTruthy();
    expect(await BatchLogEntry.count({ where: { batchId: b.id, kind: 'sign_off' } })).toBe(0);

    const signed = await t.as.head_brewer
      .post(`/api/batches/${b.id}/sign-off`)
      .set(writeHeaders())
      .send({ password: GOOD_PASSWORD });
    expect(signed.status).toBe(201);
    expect(signed.body).toMatchObject({
      signerName: t.users.head_brewer.displayName,
      meaning: 'reviewed',
      valid: true,
      contentSha256: expect.stringMatching(/^[0-9a-f]{64}$/),
    });

    const late = await t.as.assistant_brewer
      .post(`/api/batches/${b.id}/log`)
      .set(writeHeaders())
      .send(step('oxygenate'));
    expect(late.status).toBe(409);
    const fix = await t.as.assistant_brewer
      .post(`/api/batches/${b.id}/log`)
      .set(writeHeaders())
      .send({
        kind: 'correction',
        correctsEntryId: logged.body.id,
        reason: 'Refractometer re-read',
        measurements: { gravitySg: 1.06 },
      });
    expect(fix.status).toBe(201);
    expect((await t.as.head_brewer.get(`/api/batches/${b.id}`)).body.signatures[0].valid).toBe(true);

    await owner.query(`UPDATE batch_log_entries SET data = JSON_SET(data, '$.measurements.volumeL', 41) WHERE id = ?`, {
      replacements: [logged.body.id],
      type: QueryTypes.UPDATE,
    });
    expect((await t.as.head_brewer.get(`/api/batches/${b.id}`)).body.signatures[0].valid).toBe(false);
  });

  it('wrong passwords count toward the sign-in throttle', async () => {
    // A fresh app: its own limiter memory, as a restarted server has.
    const app = createApp();
    const fresh = await createTestBrewery(app);
    const b = await plannedBatch(actorOf(fresh.users.head_brewer));
    await fresh.as.assistant_brewer
      .post(`/api/batches/${b.id}/log`)
      .set(writeHeaders())
      .send(step('mash-in', { tempC: 66 }));
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++) {
      statuses.push(
        (
          await fresh.as.head_brewer
            .post(`/api/batches/${b.id}/sign-off`)
            .set(writeHeaders())
            .send({ password: `wrong-guess-${i}` })
        ).status,
      );
    }
    for (let i = 0; i < 2; i++) {
      statuses.push(
        (
          await agent(app)
            .post('/api/auth/sign-in')
            .send({ email: fresh.users.head_brewer.email, password: `wrong-guess-${i}` })
        ).status,
      );
    }
    // Three wrong signatures and two wrong sign-ins make five: even the right password is now held back.
    statuses.push(
      (
        await agent(app)
          .post('/api/auth/sign-in')
          .send({ email: fresh.users.head_brewer.email, password: GOOD_PASSWORD })
      ).status,
    );
    expect(statuses).toEqual([400, 400, 400, 401, 401, 429]);
  });
});

describe('roles and breweries', () => {
  it('the taproom manager cannot read batches or logs; another brewery’s batch answers 404', async () => {
    for (const path of [
      `/api/batches`,
      `/api/batches/${batch.id}`,
      `/api/batches/${batch.id}/log`,
      `/api/batches/${batch.id}/log/verify`,
    ]) {
      expect((await t.as.taproom_manager.get(path)).status).toBe(403);
    }
    expect(
      (await t.as.taproom_manager.post(`/api/batches/${batch.id}/log`).set(writeHeaders()).send(step('mash-in')))
        .status,
    ).toBe(403);
    expect((await other.as.head_brewer.get(`/api/batches/${batch.id}`)).status).toBe(404);
    expect(
      (await other.as.assistant_brewer.post(`/api/batches/${batch.id}/log`).set(writeHeaders()).send(step('mash-in')))
        .status,
    ).toBe(404);
    const entry = await BatchLogEntry.findOne({ where: { batchId: batch.id } });
    expect((await other.as.head_brewer.delete(`/api/batches/${batch.id}/log/${entry!.id}`)).status).toBe(404);
  });

  it('the assistant may not plan a batch; the list shows the batch with its vessel', async () => {
    expect(
      (await t.as.assistant_brewer.post('/api/batches').send({ recipeVersionId: 1, brewDate: '2026-12-01' })).status,
    ).toBe(403);
    const vessel = await Vessel.create({
      breweryId: t.brewery.id,
      name: `FV-${randomUUID().slice(0, 4)}`,
      type: 'fermenter',
      capacityL: 60,
      ratedPressureKpa: 100,
      status: 'clean',
      currentBatchId: null,
    });
    expect((await t.as.head_brewer.put(`/api/batches/${batch.id}/vessel`).send({ vesselId: vessel.id })).status).toBe(
      200,
    );
    const second = await plannedBatch(actorOf(t.users.head_brewer));
    const taken = await t.as.head_brewer.put(`/api/batches/${second.id}/vessel`).send({ vesselId: vessel.id });
    expect(taken.status).toBe(409);
    const list = await t.as.assistant_brewer.get('/api/batches?status=brewing');
    expect(list.body.items.find((i: { id: number }) => i.id === batch.id)).toMatchObject({
      vessel: { id: vessel.id },
      status: 'brewing',
    });
  });
});

describe('status', () => {
  it('moves only along the life of the beer; dumping needs a reason', async () => {
    const b = await plannedBatch(actorOf(t.users.head_brewer));
    expect((await t.as.head_brewer.post(`/api/batches/${b.id}/status`).send({ status: 'released' })).status).toBe(409);
    expect((await t.as.head_brewer.post(`/api/batches/${b.id}/status`).send({ status: 'dumped' })).status).toBe(400);
    const dumped = await t.as.head_brewer
      .post(`/api/batches/${b.id}/status`)
      .send({ status: 'dumped', reason: 'Infected starter' });
    expect(dumped.body).toMatchObject({ status: 'dumped', dumpedReason: 'Infected starter' });
  });
});
