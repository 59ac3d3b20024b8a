/** Registers the service worker that lets the app reload with no network (built app only). */
export function registerServiceWorker(): void {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  window.addEventListener('load', () => {
    navigator.serviceWorker
      .register('/sw.js')
      .catch((error: unknown) => console.warn('Offline support is unavailable', error));
  });
}

/** Forgets the answers kept for offline use: nothing of one person's stays on a shared tablet after sign-out. */
export async function forgetOfflineAnswers(): Promise<void> {
  if ('caches' in window) await caches.delete('kw-api');
}
