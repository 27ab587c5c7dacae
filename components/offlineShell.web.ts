/**
 * Registers public/sw.js so the app shell, fonts and the SQLite wasm load with the server down,
 * and hands it the URLs this page already loaded (they were fetched before it took control).
 */
export function registerOfflineShell(): void {
  if (typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  navigator.serviceWorker
    .register('/sw.js')
    .then(() => navigator.serviceWorker.ready)
    .then((reg) => {
      const urls = [location.origin + '/', ...performance.getEntriesByType('resource').map((e) => e.name)];
      reg.active?.postMessage({ type: 'cache-urls', urls });
    })
    .catch(() => undefined);
}
