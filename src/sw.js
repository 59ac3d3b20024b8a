// Kettlewright's service worker: keeps the app shell, the code of every screen, and the last answers of the
// pages a person opened, so the tablet can reload the brew-day screen, or open a screen it has not opened
// yet, with no network. Writes never pass through here: they go to the outbox in the page (src/lib/outbox.ts),
// which keeps them until the server has them.
// The build (vite.config.ts) writes this file into dist/ with the list of this build's scripts and styles in
// place of PRECACHE, so each build is a new worker that fetches its own files.
const PRECACHE = self.__PRECACHE__;
const SHELL = 'kw-shell-v1';
const API = 'kw-api';

async function cacheShell() {
  const cache = await caches.open(SHELL);
  const response = await fetch('/', { cache: 'no-store' });
  if (!response.ok) return;
  const html = await response.clone().text();
  await cache.put('/', response);
  const linked = [...html.matchAll(/(?:src|href)="(\/[^"]+)"/g)].map((m) => m[1]);
  await cache.addAll([...new Set([...linked, ...PRECACHE])]);
}

/** Scripts and styles of earlier builds: their names carry a hash, so they are never asked for again. */
async function forgetOldBuilds() {
  const cache = await caches.open(SHELL);
  const current = new Set(PRECACHE);
  for (const request of await cache.keys()) {
    const path = new URL(request.url).pathname;
    if (/\.(js|css)$/.test(path) && !current.has(path)) await cache.delete(request);
  }
}

self.addEventListener('install', (event) => {
  event.waitUntil(cacheShell().then(() => self.skipWaiting()));
});

self.addEventListener('activate', (event) => {
  event.waitUntil(forgetOldBuilds().then(() => self.clients.claim()));
});

async function networkFirst(request, cacheName, key) {
  const cache = await caches.open(cacheName);
  try {
    const response = await fetch(request);
    if (response.ok) await cache.put(key ?? request, response.clone());
    return response;
  } catch (error) {
    const cached = await cache.match(key ?? request);
    if (cached) return cached;
    throw error;
  }
}

async function cacheFirst(request) {
  const cache = await caches.open(SHELL);
  const cached = await cache.match(request);
  if (cached) return cached;
  const response = await fetch(request);
  if (response.ok) await cache.put(request, response.clone());
  return response;
}

self.addEventListener('fetch', (event) => {
  const { request } = event;
  const url = new URL(request.url);
  if (request.method !== 'GET' || url.origin !== self.location.origin) return;
  if (request.mode === 'navigate') {
    // Every page is the same single-page shell.
    event.respondWith(networkFirst(request, SHELL, '/'));
  } else if (url.pathname.startsWith('/api/')) {
    // Files (photos, lab sheets up to 15 MB) are not kept: only the answers a screen needs to open offline.
    if (
      url.pathname === '/api/health' ||
      url.pathname.startsWith('/api/dev/') ||
      url.pathname.startsWith('/api/attachments/')
    )
      return;
    event.respondWith(networkFirst(request, API));
  } else {
    event.respondWith(cacheFirst(request));
  }
});
