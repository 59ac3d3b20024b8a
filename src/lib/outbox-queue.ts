/**
 * The device's outbox for signed writes (log entries, readings…): every write is kept in a store (IndexedDB on the
 * page, see src/lib/outbox.ts) with its idempotency key and captured time, survives reloads, and is sent in order
 * when the network allows. Nothing here needs a browser, so the restart fault script drives the same queue in Node.
 *
 * - A network failure, 5xx, 409 or 429 keeps the item and retries with backoff.
 * - A 401 (session ended) pauses the whole outbox until the person signs in again; the items are then
 *   sent with their original keys, so nothing is written twice.
 * - Any other 4xx marks the item rejected with the server's message; it stays visible until the person dismisses it.
 */

export interface OutboxItem {
  /** The idempotency key, also the item's id. */
  idempotencyKey: string;
  url: string;
  body: unknown;
  /** When the person did it, on this device (ISO). */
  capturedAt: string;
  /** What it is, in words, for the waiting list ("Mash in · 152.0 °F"). */
  label: string;
  /** Groups items for a screen, e.g. `batch:12`. */
  group: string;
  /** Who did it: only their own session sends it, so a shared tablet never signs one person's work as another's. */
  userId: number;
  authorName: string;
  state: 'waiting' | 'rejected';
  attempts: number;
  /** The server's message for a rejected item, or the last failure while waiting. */
  message?: string;
}

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
  | { kind: 'rejected'; message: string };

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
  if (response.status === 401) return { kind: 'signed-out' };
  if (response.status >= 500 || response.status === 409 || response.status === 429) return { kind: 'retry', message };
  return { kind: 'rejected', message };
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
    for (;;) {
      const user = snapshot.user;
      if (snapshot.needsSignIn || !user) return;
      const item = snapshot.items.find((i) => i.state === 'waiting' && i.userId === user.id);
      if (!item) return;
      const result = await send(item);
      const same = (i: OutboxItem) => i.idempotencyKey === item.idempotencyKey;
      if (result.kind === 'sent') {
        await change((items) => items.filter((i) => !same(i)));
        sentListeners.forEach((l) => l(item));
      } else if (result.kind === 'rejected') {
        await change((items) => items.map((i) => (same(i) ? { ...i, state: 'rejected', message: result.message } : i)));
      } else if (result.kind === 'signed-out') {
        publish({ needsSignIn: true });
        return;
      } else {
        // Keep the order: nothing after this item goes before it does.
        const attempts = item.attempts + 1;
        await change((items) => items.map((i) => (same(i) ? { ...i, attempts, message: result.message } : i)));
        clearTimeout(timer);
        timer = setTimeout(() => void flush(), backoffMs(attempts));
        return;
      }
    }
  }

  /** Sends what is waiting, in order; a second call while sending waits for the same run. */
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
    async enqueue(
      write: Pick<OutboxItem, 'url' | 'body' | 'label' | 'group'> & { capturedAt?: string },
    ): Promise<OutboxItem> {
      const user = snapshot.user;
      if (!user) throw new Error('The outbox has no signed-in person: call setUser() first');
      const item: OutboxItem = {
        ...write,
        userId: user.id,
        authorName: user.displayName,
        idempotencyKey: crypto.randomUUID(),
        capturedAt: write.capturedAt ?? new Date().toISOString(),
        state: 'waiting',
        attempts: 0,
      };
      await change((items) => [...items, item]);
      void flush();
      return item;
    },
    /** Who is signed in on this page (after sign-in, or signing in again): their waiting items go, with their original keys. */
    setUser(user: { id: number; displayName: string }) {
      publish({ user, needsSignIn: false });
      void flush();
    },
    /** Removes a rejected item the person has read (and re-entered if needed). */
    dismiss: (idempotencyKey: string) =>
      change((items) => items.filter((i) => i.idempotencyKey !== idempotencyKey || i.state !== 'rejected')),
    /** Drops the signed-in person's items (sign-out after they confirmed); other people's stay. */
    discardMine: () => change((items) => items.filter((i) => i.userId !== snapshot.user?.id)),
  };
}
