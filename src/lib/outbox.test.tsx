import { afterEach, describe, expect, it, vi } from 'vitest';
import { backoffMs, createOutbox, sendItem, type OutboxItem, type OutboxStore, type SendResult } from './outbox-queue';

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

/** A server that answers each send from a script and records what it received. */
function scriptedServer(answers: SendResult['kind'][]) {
  const received: { label: string; key: string }[] = [];
  const send = async (item: OutboxItem): Promise<SendResult> => {
    received.push({ label: item.label, key: item.idempotencyKey });
    const kind = answers.shift() ?? 'sent';
    if (kind === 'retry' || kind === 'rejected')
      return { kind, message: kind === 'rejected' ? 'Temperature must be at most 110' : 'No connection' };
    return { kind };
  };
  return { received, send };
}

const write = (label: string) => ({ url: '/api/batches/1/log', body: { label }, label, group: 'batch:1' });

describe('outbox', () => {
  it('keeps order: a failed send holds back the items after it, and they go in order once it passes', async () => {
    const store = memoryStore();
    const server = scriptedServer(['retry']);
    const box = createOutbox(store, server.send);
    box.setUser({ id: 7, displayName: 'Ilya Brandt' });
    await box.enqueue(write('one'));
    await box.flush();
    await box.enqueue(write('two'));
    await box.flush();
    expect(server.received.map((r) => r.label)).toEqual(['one', 'one', 'two']);
    expect(store.items).toEqual([]);
  });

  it('a 401 keeps every item and sends them with their original keys after signing in again', async () => {
    const store = memoryStore();
    const server = scriptedServer(['signed-out']);
    const box = createOutbox(store, server.send);
    box.setUser({ id: 7, displayName: 'Ilya Brandt' });
    const item = await box.enqueue(write('mash in'));
    await box.flush();
    expect(box.getSnapshot().needsSignIn).toBe(true);
    expect(store.items.map((i) => i.idempotencyKey)).toEqual([item.idempotencyKey]);
    box.setUser({ id: 7, displayName: 'Ilya Brandt' });
    await box.flush();
    expect(server.received.map((r) => r.key)).toEqual([item.idempotencyKey, item.idempotencyKey]);
    expect(store.items).toEqual([]);
  });

  it('a rejected item stays visible with the server’s message and does not block the next one', async () => {
    const store = memoryStore();
    const server = scriptedServer(['rejected', 'sent']);
    const box = createOutbox(store, server.send);
    box.setUser({ id: 7, displayName: 'Ilya Brandt' });
    await box.enqueue(write('bad'));
    await box.enqueue(write('good'));
    await box.flush();
    expect(store.items).toHaveLength(1);
    expect(store.items[0]).toMatchObject({
      label: 'bad',
      state: 'rejected',
      message: 'Temperature must be at most 110',
    });
    await box.dismiss(store.items[0]!.idempotencyKey);
    expect(store.items).toEqual([]);
  });

  it('sends only the signed-in person’s items: another person’s wait for them', async () => {
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
    const server = scriptedServer([]);
    const box = createOutbox(store, server.send);
    box.setUser({ id: 8, displayName: 'Maren Holt' });
    await box.flush();
    expect(server.received.map((r) => r.label)).toEqual(['by eight']);
    expect(store.items.map((i) => i.label)).toEqual(['by seven']);
  });

  it('backs off exponentially up to a minute', () => {
    expect([1, 2, 3, 7, 20].map(backoffMs)).toEqual([1000, 2000, 4000, 60_000, 60_000]);
  });
});

describe('sending one item', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('keeps the fields a refusal names, so the waiting list says what to fix', async () => {
    const refusal = {
      error: {
        code: 'invalid',
        message: 'Some fields need attention',
        fields: { 'measurements.tempC': 'Temperature (°C) must be at most 110' },
      },
    };
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
    expect(await sendItem(item, 'dev-test')).toEqual({
      kind: 'rejected',
      message: 'Some fields need attention: Temperature (°C) must be at most 110',
    });
  });
});
