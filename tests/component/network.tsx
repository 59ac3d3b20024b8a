// What component tests stand on instead of a server: a fetch stub answering by method and path, and an
// in-memory IndexedDB so the device outbox keeps and sends writes as it does on a tablet. The screens use
// their real query hooks and the real outbox over these.
import type { ReactNode } from 'react';
import { vi } from 'vitest';
import { QueryClientProvider } from '@tanstack/react-query';
import { createQueryClient } from '../../src/lib/query-client';

export interface Sent {
  method: string;
  path: string;
  body: unknown;
}

type Answer = { status: number; body?: unknown };

/** Stubs fetch: `answers` maps "METHOD /path" to an answer; every request is recorded in `sent`. */
export function stubNetwork(answers: Record<string, Answer | ((body: unknown) => Answer)>): { sent: Sent[] } {
  const sent: Sent[] = [];
  vi.stubGlobal('fetch', async (input: string, init: RequestInit = {}) => {
    const method = init.method ?? 'GET';
    const path = String(input);
    const body = typeof init.body === 'string' ? JSON.parse(init.body) : undefined;
    sent.push({ method, path, body });
    const found = answers[`${method} ${path}`];
    const answer = typeof found === 'function' ? found(body) : (found ?? { status: 404, body: { error: {} } });
    return new Response(answer.body === undefined ? null : JSON.stringify(answer.body), {
      status: answer.status,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  return { sent };
}

/**
 * Just enough IndexedDB for idb-keyval's get and update, kept in memory (jsdom has none). Requests answer on a
 * later task, as a browser's do, so the outbox meets the same ordering it meets on a tablet.
 */
export function installMemoryIndexedDb(): void {
  const data = new Map<unknown, unknown>();
  const later = (fn: () => void) => setTimeout(fn, 0);
  type Request = { result?: unknown; onsuccess?: (this: Request) => void; onupgradeneeded?: () => void };
  const request = (produce: () => unknown): Request => {
    const req: Request = {};
    later(() => {
      req.result = produce();
      req.onsuccess?.call(req);
    });
    return req;
  };
  const db = {
    createObjectStore: () => undefined,
    transaction: () => {
      const tx: { oncomplete?: () => void; objectStore?: () => unknown } = {};
      const store = {
        transaction: tx,
        get: (key: unknown) => request(() => data.get(key)),
        put: (value: unknown, key: unknown) => {
          data.set(key, value);
          later(() => tx.oncomplete?.());
          return request(() => key);
        },
      };
      tx.objectStore = () => store;
      return tx;
    },
  };
  vi.stubGlobal('indexedDB', {
    open: () => {
      const req: Request = { result: db };
      later(() => {
        req.onupgradeneeded?.();
        req.onsuccess?.call(req);
      });
      return req;
    },
  });
}

/** The app's own query client around a screen, fresh for each test. */
export function withQueries(children: ReactNode) {
  return <QueryClientProvider client={createQueryClient()}>{children}</QueryClientProvider>;
}
