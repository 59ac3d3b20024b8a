/**
 * The device's outbox for signed writes (log entries, readings…): every write is kept in a store (IndexedDB on the
 * page, see src/lib/outbox.ts) with its idempotency key and captured time, survives reloads, and is sent in order
 * per group (one batch's brew day, its cellar work) when the network allows. Nothing here needs a browser, so the
 * restart fault script drives the same queue in Node. It decides by the answer's error code (shared/schemas/errors.ts):
 *
 * - A network failure, or a code a retry can pass (a server failure, a 429, a reading before its knockout),
 *   keeps the item and retries with backoff. Later items of the same group wait behind it; other groups go on.
 * - A 401 (session ended) pauses the whole outbox until the person signs in again; the items are then
 *   sent with their original keys, so nothing is written twice.
 * - A refusal for good (the brew day is signed off, the batch is packaged, a field is wrong) sets the item aside
 *   with the server's reason: it no longer holds anything back, and stays on the device until the person sends it
 *   again as a note or discards it.
 */
import { API_ERRORS, errorCodeOf, type ApiErrorCode } from '../../shared/schemas/errors';

export interface OutboxItem {
  /** The idempotency key, also the item's id. */
  idempotencyKey: string;
  url: string;
  body: unknown;
  /** When the person did it, on this device (ISO). */
  capturedAt: string;
  /** What it is, in words, for the waiting list ("Mash in · 152.0 °F"). */
  label: string;
  /** Groups items for a screen, e.g. `batch:12`; items of one group are sent in order. */
  group: string;
  /** Who did it: only their own session sends it, so a shared tablet never signs one person's work as another's. */
  userId: number;
  authorName: string;
  /** `rejected`: refused for good and set aside (no longer sent, kept until the person acts on it). */
  state: 'waiting' | 'rejected';
  attempts: number;
  /** The server's reason for a set-aside item, or the last failure while waiting. */
  message?: string;
  /** The refusal's code, for a set-aside item. */
  code?: ApiErrorCode;
}

/** What a screen hands the outbox to keep and send. */
export type OutboxWrite = Pick<OutboxItem, 'url' | 'body' | 'label' | 'group'>;

export interface OutboxStore {
  get(): Promise<OutboxItem[] | undefined>;
  update(fn: (items: OutboxItem[]) => OutboxItem[]): Promise<void>;
}

/** Longest wait between retries. */
const MAX_BACKOFF_MS = 60_000;
export const backoffMs = (attempts: number) => Math.min(MAX_BACKOFF_MS, 1000 * 2 ** Math.max(0, attempts - 1));

export type SendResult =
  | { kind: 'sent' }
  | { kind: 'retry'; message: string }
  | { kind: 'signed-out' }
  | { kind: 'rejected'; code: ApiErrorCode; message: string };

/** Sends one item the way the server expects signed writes, and sorts the answer into what to do next. */
export async function sendItem(item: OutboxItem, deviceId: string): Promise<SendResult> {
  let response: Response;
  try {
    response = await fetch(item.url, {
      method: 'POST',
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json',
        'Content-Type': 'application/json',
        'x-kettlewright': '1',
        'Idempotency-Key': item.idempotencyKey,
        'X-Captured-At': item.capturedAt,
        'X-Device-Id': deviceId,
      },
      body: JSON.stringify(item.body),
    });
  } catch {
    return { kind: 'retry', message: 'No connection' };
  }
  if (response.ok) return { kind: 'sent' };
  const data = (await response.json().catch(() => null)) as {
    error?: { message?: string; fields?: Record<string, string> };
  } | null;
  // A refusal names the fields at fault ("Some fields need attention: Temperature (°C) must be at most 110").
  const fields = Object.values(data?.error?.fields ?? {});
  const general = data?.error?.message ?? `The server answered ${response.status}`;
  const message = fields.length ? `${general}: ${fields.join('; ')}` : general;
  const code = errorCodeOf(response.status, data);
  if (code === 'unauthenticated') return { kind: 'signed-out' };
  if (API_ERRORS[code].retryable) return { kind: 'retry', message };
  return { kind: 'rejected', code, message };
}

export interface OutboxSnapshot {
  items: OutboxItem[];
  /** The signed-in person on this page; only their items are sent. */
  user: { id: number; displayName: string } | null;
  /** The session ended: sign in again to send. */
  needsSignIn: boolean;
}

/** One outbox per page: holds the items in memory, mirrors them to the store, and sends them one at a time. */
export function createOutbox(store: OutboxStore, send: (item: OutboxItem) => Promise<SendResult>) {
  let snapshot: OutboxSnapshot = { items: [], user: null, needsSignIn: false };
  const listeners = new Set<() => void>();
  const sentListeners = new Set<(item: OutboxItem) => void>();
  let running: Promise<void> | null = null;
  let timer: ReturnType<typeof setTimeout> | undefined;

  const publish = (next: Partial<OutboxSnapshot>) => {
    snapshot = { ...snapshot, ...next };
    listeners.forEach((l) => l());
  };
  const reload = async () => publish({ items: (await store.get()) ?? [] });
  const change = async (fn: (items: OutboxItem[]) => OutboxItem[]) => {
    await store.update(fn);
    await reload();
  };

  async function drain(): Promise<void> {
    await reload();
    /** Groups whose first item failed this run: the items after it wait for it, other groups go on. */
    const held = new Set<string>();
    let retryInMs: number | undefined;
    for (;;) {
      const user = snapshot.user;
      if (snapshot.needsSignIn || !user) return;
      const item = snapshot.items.find((i) => i.state === 'waiting' && i.userId === user.id && !held.has(i.group));
      if (!item) break;
      const result = await send(item);
      const same = (i: OutboxItem) => i.idempotencyKey === item.idempotencyKey;
      if (result.kind === 'sent') {
        await change((items) => items.filter((i) => !same(i)));
        sentListeners.forEach((l) => l(item));
      } else if (result.kind === 'rejected') {
        const { code, message } = result;
        await change((items) => items.map((i) => (same(i) ? { ...i, state: 'rejected', code, message } : i)));
      } else if (result.kind === 'signed-out') {
        publish({ needsSignIn: true });
        return;
      } else {
        const attempts = item.attempts + 1;
        await change((items) => items.map((i) => (same(i) ? { ...i, attempts, message: result.message } : i)));
        held.add(item.group);
        retryInMs = Math.min(retryInMs ?? Infinity, backoffMs(attempts));
      }
    }
    if (retryInMs !== undefined) {
      clearTimeout(timer);
      timer = setTimeout(() => void flush(), retryInMs);
    }
  }

  /** A new waiting item, signed by the person on this page. */
  function newItem(write: OutboxWrite & { capturedAt?: string }): OutboxItem {
    const user = snapshot.user;
    if (!user) throw new Error('The outbox has no signed-in person: call setUser() first');
    return {
      ...write,
      userId: user.id,
      authorName: user.displayName,
      idempotencyKey: crypto.randomUUID(),
      capturedAt: write.capturedAt ?? new Date().toISOString(),
      state: 'waiting',
      attempts: 0,
    };
  }

  /** Sends what is waiting, in order per group; a second call while sending waits for the same run. */
  function flush(): Promise<void> {
    running ??= drain().finally(() => {
      running = null;
    });
    return running;
  }

  return {
    subscribe: (listener: () => void) => {
      listeners.add(listener);
      return () => {
        listeners.delete(listener);
      };
    },
    getSnapshot: () => snapshot,
    /** Called after each item the server accepted (e.g. to refresh what the screen shows). */
    onSent: (listener: (item: OutboxItem) => void) => {
      sentListeners.add(listener);
      return () => {
        sentListeners.delete(listener);
      };
    },
    load: reload,
    flush,
    /** Keeps a write on the device and tries to send it straight away. */
    async enqueue(write: OutboxWrite & { capturedAt?: string }): Promise<OutboxItem> {
      const item = newItem(write);
      await change((items) => [...items, item]);
      void flush();
      return item;
    },
    /**
     * Sends a set-aside item's content again as another write (e.g. a note on the batch with the reason), in its
     * place in one step: it is never lost, nor kept twice. Only the person who typed it may.
     */
    async resendAs(idempotencyKey: string, write: OutboxWrite): Promise<OutboxItem> {
      const next = newItem(write);
      const original = snapshot.items.find((i) => i.idempotencyKey === idempotencyKey && i.state === 'rejected');
      if (!original || original.userId !== next.userId) throw new Error('Only its author can send a set-aside entry');
      await change((items) => [...items.filter((i) => i.idempotencyKey !== idempotencyKey), next]);
      void flush();
      return next;
    },
    /** Who is signed in on this page (after sign-in, or signing in again): their waiting items go, with their original keys. */
    setUser(user: { id: number; displayName: string }) {
      publish({ user, needsSignIn: false });
      void flush();
    },
    /** Removes a set-aside item the person has read (and re-entered, or chose to discard). */
    dismiss: (idempotencyKey: string) =>
      change((items) => items.filter((i) => i.idempotencyKey !== idempotencyKey || i.state !== 'rejected')),
    /** Drops the signed-in person's items (sign-out after they confirmed); other people's stay. */
    discardMine: () => change((items) => items.filter((i) => i.userId !== snapshot.user?.id)),
  };
}
