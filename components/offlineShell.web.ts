/**
 * Registers public/sw.js so the app shell, fonts and the SQLite wasm load with the server down,
 * and hands it the URLs this page already loaded (they were fetched before it took control).
 * When the worker has them, `<html data-offline-shell="ready">` is set and an
 * "tessera:offline-ready" event fires: from then on a reload works with no connection.
 */
export function registerOfflineShell(): void {
  if (typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  navigator.serviceWorker.addEventListener('message', (event: MessageEvent) => {
    if (event.data?.type === 'cached') {
      document.documentElement.dataset.offlineShell = 'ready';
      window.dispatchEvent(new CustomEvent('tessera:offline-ready', { detail: event.data }));
    }
  });
  navigator.serviceWorker
    .register('/sw.js')
    .then(() => navigator.serviceWorker.ready)
    .then((reg) => {
      const urls = [location.origin + '/', ...performance.getEntriesByType('resource').map((e) => e.name)];
      reg.active?.postMessage({ type: 'cache-urls', urls });
    })
    .catch(() => undefined);
}

/** True once the offline shell is cached (see registerOfflineShell). */
export function offlineShellReady(): boolean {
  return typeof document !== 'undefined' && document.documentElement.dataset.offlineShell === 'ready';
}
