// The page's outbox: the queue of src/lib/outbox-queue.ts kept in IndexedDB and sent with this device's id.
import { useEffect, useSyncExternalStore } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { get, update } from 'idb-keyval';
import { createOutbox, sendItem, type OutboxItem, type OutboxSnapshot, type OutboxStore } from './outbox-queue';

const KEY = 'kettlewright-outbox';
const idbStore: OutboxStore = {
  get: () => get<OutboxItem[]>(KEY),
  update: (fn) => update<OutboxItem[]>(KEY, (items) => fn(items ?? [])),
};

/** A stable id for this device, sent with every write. */
export function deviceId(): string {
  let id = localStorage.getItem('kettlewright-device');
  if (!id) {
    id = `dev-${crypto.randomUUID()}`;
    localStorage.setItem('kettlewright-device', id);
  }
  return id;
}

export type Outbox = ReturnType<typeof createOutbox>;

let shared: Outbox | undefined;
/** The page's outbox: loads what an earlier visit left, sends it, and retries whenever the network returns. */
export function outbox(): Outbox {
  if (!shared) {
    const box = createOutbox(idbStore, (item) => sendItem(item, deviceId()));
    shared = box;
    void box.flush();
    window.addEventListener('online', () => void box.flush());
  }
  return shared;
}

/** Items waiting or set aside (optionally for one group) and whether the person must sign in again. */
export function useOutbox(group?: string): OutboxSnapshot {
  const box = outbox();
  const snap = useSyncExternalStore(box.subscribe, box.getSnapshot);
  return group ? { ...snap, items: snap.items.filter((i) => i.group === group) } : snap;
}

/** Writes delivered within this long of each other (a queue flushing after the network returns) refresh once. */
const REFRESH_AFTER_MS = 200;

/**
 * Marks every answer stale once writes reach the server: one write can change several screens (a corrected
 * reading moves the curve, the vessel board, the log and the release numbers). Screens on show refetch;
 * the others when next opened. Mounted once, in the signed-in layout.
 */
export function useRefreshOnDelivery() {
  const client = useQueryClient();
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    const stop = outbox().onSent(() => {
      clearTimeout(timer);
      timer = setTimeout(() => void client.invalidateQueries(), REFRESH_AFTER_MS);
    });
    return () => {
      clearTimeout(timer);
      stop();
    };
  }, [client]);
}
