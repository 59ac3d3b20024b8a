// The error contract the device outbox decides by: each refusal of a signed write carries a code from
// shared/schemas/errors.ts and says whether sending it again, unchanged, can succeed.
import { beforeAll, describe, expect, it } from 'vitest';
import { API_ERRORS } from '../../shared/schemas/errors';
import { Batch } from '../../server/models';
import { createTestBrewery, GOOD_PASSWORD, type TestBrewery } from './helpers';
import { plannedBatch, writeHeaders } from './batch-fixtures';

let t: TestBrewery;
beforeAll(async () => {
  t = await createTestBrewery();
});

const batchFor = () => plannedBatch({ id: t.users.head_brewer.id, breweryId: t.brewery.id });
const READING = { kind: 'reading', method: 'hydrometer', gravity: 1.05, gravityUnit: 'sg', temp: 19, tempUnit: 'c' };
const log = (batchId: number, body: object) =>
  t.as.assistant_brewer.post(`/api/batches/${batchId}/log`).set(writeHeaders()).send(body);
const reading = (batchId: number) =>
  t.as.assistant_brewer.post(`/api/cellar/batches/${batchId}/readings`).set(writeHeaders()).send(READING);

describe('refusals of signed writes', () => {
  it('a step after the sign-off is refused for good (signed_off); a note may still follow', async () => {
    const b = await batchFor();
    expect((await log(b.id, { kind: 'step', stepKey: 'mash-in', label: 'Mash in' })).status).toBe(201);
    const signed = await t.as.head_brewer
      .post(`/api/batches/${b.id}/sign-off`)
      .set(writeHeaders())
      .send({ password: GOOD_PASSWORD });
    expect(signed.status).toBe(201);

    const late = await log(b.id, { kind: 'step', stepKey: 'vorlauf', label: 'Vorlauf' });
    expect(late.status).toBe(409);
    expect(late.body.error).toMatchObject({ code: 'signed_off', retryable: false, message: expect.any(String) });
    const again = await t.as.head_brewer
      .post(`/api/batches/${b.id}/sign-off`)
      .set(writeHeaders())
      .send({ password: GOOD_PASSWORD });
    expect(again.body.error).toMatchObject({ code: 'signed_off', retryable: false });

    const note = await log(b.id, { kind: 'note', text: 'Vorlauf at 10:02, typed offline; refused after the sign-off' });
    expect(note.status).toBe(201);
    // The signature still holds: the note came after what it signed.
    const detail = await t.as.head_brewer.get(`/api/batches/${b.id}`);
    expect(detail.body.signatures.map((s: { valid: boolean }) => s.valid)).toEqual([true]);
  });

  it('a reading before knockout can pass later (not_yet); on a packaged batch it never will (batch_closed)', async () => {
    const b = await batchFor();
    const early = await reading(b.id);
    expect(early.status).toBe(409);
    expect(early.body.error).toMatchObject({ code: 'not_yet', retryable: true });

    await Batch.update({ status: 'packaged' }, { where: { id: b.id } });
    const late = await reading(b.id);
    expect(late.status).toBe(409);
    expect(late.body.error).toMatchObject({ code: 'batch_closed', retryable: false });
    const action = await t.as.assistant_brewer
      .post(`/api/cellar/batches/${b.id}/actions`)
      .set(writeHeaders())
      .send({ kind: 'action', action: 'cold_crash', temp: 1, tempUnit: 'c' });
    expect(action.body.error).toMatchObject({ code: 'batch_closed', retryable: false });
    const packaging = await t.as.assistant_brewer
      .post(`/api/cellar/batches/${b.id}/packaging`)
      .set(writeHeaders())
      .send({ kind: 'packaging', lines: [{ kind: 'can', sizeMl: 473, count: 1 }] });
    expect(packaging.body.error).toMatchObject({ code: 'batch_closed', retryable: false });
  });

  it('a field out of range is refused for good, naming the field', async () => {
    const b = await batchFor();
    const res = await log(b.id, { kind: 'measurement', label: 'Strike', measurements: { tempC: 400 } });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({
      code: 'invalid',
      retryable: false,
      fields: { 'measurements.tempC': expect.any(String) },
    });
  });

  it('every code answers with the status and retry flag of the one table', async () => {
    const res = await t.as.head_brewer.get('/api/batches/999999999');
    expect(res.status).toBe(API_ERRORS.not_found.status);
    expect(res.body.error).toMatchObject({ code: 'not_found', retryable: API_ERRORS.not_found.retryable });
  });
});
