import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorBody, type ApiErrorCode } from '../../shared/schemas/errors';
import { backoffMs, createOutbox, sendItem, type OutboxItem, type OutboxStore } from './outbox-queue';

/** The real sender, as the page wires it (src/lib/outbox.ts) with this device's id. */
const send = (item: OutboxItem) => sendItem(item, 'tablet-test-01');

/** The outbox's store kept in memory, standing in for IndexedDB (which jsdom lacks). */
function memoryStore(): OutboxStore & { items: OutboxItem[] } {
  const s = {
    items: [] as OutboxItem[],
    get: async () => s.items,
    update: async (fn: (items: OutboxItem[]) => OutboxItem[]) => {
      s.items = fn(s.items);
    },
  };
  return s;
}

type Answer = 'ok' | 'offline' | 'proxy-502' | ApiErrorCode;
const STATUS: Partial<Record<ApiErrorCode, number>> = {
  invalid: 400,
  unauthenticated: 401,
  signed_off: 409,
  batch_closed: 409,
  not_yet: 409,
  too_many_attempts: 429,
  unavailable: 503,
};

/**
 * The network as the real sendItem meets it: fetch answers each request from a script per label (the first
 * answer first, then 'ok'), as the API would, and records what arrived.
 */
function stubNetwork(script: Record<string, Answer[]> = {}) {
  const received: { url: string; label: string; key: string; body: unknown }[] = [];
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    const body = JSON.parse(typeof init.body === 'string' ? init.body : '{}') as { label?: string; text?: string };
    const label = body.label ?? body.text ?? '';
    const answer = script[label]?.shift() ?? 'ok';
    if (answer === 'offline') throw new TypeError('Failed to fetch');
    received.push({ url, label, key: (init.headers as Record<string, string>)['Idempotency-Key']!, body });
    if (answer === 'ok') return new Response('{}', { status: 201 });
    if (answer === 'proxy-502') return new Response('<html>Bad gateway</html>', { status: 502 });
    const message = answer === 'signed_off' ? 'The brew day is signed off: add a correction instead.' : answer;
    return new Response(JSON.stringify(errorBody(answer, message)), {
      status: STATUS[answer] ?? 400,
      headers: { 'content-type': 'application/json' },
    });
  });
  return received;
}

const write = (label: string, group = 'batch:1') => ({
  url: `/api/batches/${group.split(':')[1]}/log`,
  body: { label },
  label,
  group,
});
const ILYA = { id: 7, displayName: 'Ilya Brandt' };

afterEach(() => vi.unstubAllGlobals());

describe('outbox', () => {
  it('keeps order within a batch: a failed send holds back the items after it, and they go in order once it passes', async () => {
    const received = stubNetwork({ one: ['offline'] });
    const store = memoryStore();
    const box = createOutbox(store, send);
    box.setUser(ILYA);
    await box.enqueue(write('one'));
    await box.enqueue(write('two'));
    await box.flush();
    expect(store.items.map((i) => [i.label, i.attempts])).toEqual([
      ['one', 1],
      ['two', 0],
    ]);
    await box.flush();
    expect(received.map((r) => r.label)).toEqual(['one', 'two']);
    expect(store.items).toEqual([]);
  });

  it('an item that keeps failing on one batch never blocks another batch', async () => {
    const received = stubNetwork({ 'A reading': ['not_yet', 'unavailable', 'proxy-502', 'too_many_attempts'] });
    const store = memoryStore();
    const box = createOutbox(store, send);
    box.setUser(ILYA);
    await box.enqueue(write('A reading', 'cellar:1'));
    await box.enqueue(write('A later reading', 'cellar:1'));
    await box.enqueue(write('B step', 'batch:2'));
    for (let i = 0; i < 4; i += 1) await box.flush();
    // Batch 2 went at once; batch 1's first item was retried on each code a retry can pass, the second waited.
    expect(received.map((r) => r.label)).toEqual(['A reading', 'B step', 'A reading', 'A reading', 'A reading']);
    expect(store.items.map((i) => [i.label, i.state, i.attempts])).toEqual([
      ['A reading', 'waiting', 4],
      ['A later reading', 'waiting', 0],
    ]);
    await box.flush();
    expect(received.map((r) => r.label).slice(-2)).toEqual(['A reading', 'A later reading']);
    expect(store.items).toEqual([]);
  });

  it('sets aside what is refused for good, with the reason: it is not retried and the next entries go', async () => {
    const received = stubNetwork({ 'Mash in': ['signed_off'], Vorlauf: ['signed_off'] });
    const store = memoryStore();
    const box = createOutbox(store, send);
    box.setUser(ILYA);
    await box.enqueue(write('Mash in'));
    await box.enqueue(write('Vorlauf'));
    await box.enqueue(write('Reading', 'cellar:2'));
    await box.flush();
    await box.flush();
    expect(received.map((r) => r.label)).toEqual(['Mash in', 'Vorlauf', 'Reading']);
    expect(store.items.map((i) => [i.label, i.state, i.code, i.message])).toEqual([
      ['Mash in', 'rejected', 'signed_off', 'The brew day is signed off: add a correction instead.'],
      ['Vorlauf', 'rejected', 'signed_off', 'The brew day is signed off: add a correction instead.'],
    ]);
    // They survive a reload: a new page's outbox over the same store still shows them.
    const reloaded = createOutbox(store, send);
    await reloaded.load();
    expect(reloaded.getSnapshot().items.map((i) => i.label)).toEqual(['Mash in', 'Vorlauf']);
  });

  it('sends a set-aside entry again as a note in its place, with a new key; or discards it', async () => {
    const received = stubNetwork({ 'Mash in': ['batch_closed'], Vorlauf: ['batch_closed'] });
    const store = memoryStore();
    const box = createOutbox(store, send);
    box.setUser(ILYA);
    const refused = await box.enqueue(write('Mash in'));
    await box.enqueue(write('Vorlauf'));
    await box.flush();
    const note = { url: '/api/batches/1/log', body: { kind: 'note', text: 'Mash in at 152 °F, refused' } };
    await box.resendAs(refused.idempotencyKey, { ...note, label: 'Note: Mash in', group: 'batch:1' });
    await box.flush();
    expect(received.at(-1)).toMatchObject({ url: '/api/batches/1/log', body: note.body });
    expect(received.at(-1)!.key).not.toBe(refused.idempotencyKey);
    expect(store.items.map((i) => i.label)).toEqual(['Vorlauf']);
    await box.dismiss(store.items[0]!.idempotencyKey);
    expect(store.items).toEqual([]);
  });

  it('only the author may send a set-aside entry again', async () => {
    stubNetwork({ 'Mash in': ['signed_off'] });
    const store = memoryStore();
    const box = createOutbox(store, send);
    box.setUser(ILYA);
    const refused = await box.enqueue(write('Mash in'));
    await box.flush();
    box.setUser({ id: 8, displayName: 'Maren Holt' });
    await expect(box.resendAs(refused.idempotencyKey, write('Note: Mash in'))).rejects.toThrow(/author/);
    expect(store.items.map((i) => i.state)).toEqual(['rejected']);
  });

  it('a 401 keeps every item and sends them with their original keys after signing in again', async () => {
    const received = stubNetwork({ 'mash in': ['unauthenticated'] });
    const store = memoryStore();
    const box = createOutbox(store, send);
    box.setUser(ILYA);
    const item = await box.enqueue(write('mash in'));
    await box.flush();
    expect(box.getSnapshot().needsSignIn).toBe(true);
    expect(store.items.map((i) => i.idempotencyKey)).toEqual([item.idempotencyKey]);
    box.setUser(ILYA);
    await box.flush();
    expect(received.map((r) => r.key)).toEqual([item.idempotencyKey, item.idempotencyKey]);
    expect(store.items).toEqual([]);
  });

  it('sends only the signed-in person’s items: another person’s wait for them', async () => {
    const received = stubNetwork();
    const store = memoryStore();
    const item = (label: string, userId: number): OutboxItem => ({
      ...write(label),
      authorName: 'someone',
      idempotencyKey: label,
      capturedAt: '2026-12-01T12:00:00Z',
      userId,
      state: 'waiting',
      attempts: 0,
    });
    store.items = [item('by seven', 7), item('by eight', 8)];
    const box = createOutbox(store, send);
    box.setUser({ id: 8, displayName: 'Maren Holt' });
    await box.flush();
    expect(received.map((r) => r.label)).toEqual(['by eight']);
    expect(store.items.map((i) => i.label)).toEqual(['by seven']);
  });

  it('backs off exponentially up to a minute', () => {
    expect([1, 2, 3, 7, 20].map(backoffMs)).toEqual([1000, 2000, 4000, 60_000, 60_000]);
  });
});

describe('sending one item', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('keeps the fields a refusal names, so the set-aside entry says what to fix', async () => {
    const refusal = errorBody('invalid', 'Some fields need attention', {
      'measurements.tempC': 'Temperature (°C) must be at most 110',
    });
    vi.stubGlobal(
      'fetch',
      async () =>
        new Response(JSON.stringify(refusal), { status: 400, headers: { 'content-type': 'application/json' } }),
    );
    const item = {
      url: '/api/batches/1/log',
      body: {},
      label: 'Mash in',
      group: 'batch:1',
      idempotencyKey: 'k',
      capturedAt: new Date().toISOString(),
    } as OutboxItem;
    expect(await sendItem(item, 'tablet-test-01')).toEqual({
      kind: 'rejected',
      code: 'invalid',
      message: 'Some fields need attention: Temperature (°C) must be at most 110',
    });
  });
});
