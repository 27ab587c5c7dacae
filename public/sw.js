// Tessera offline shell: network first for everything of our own origin except the API, falling
// back to the cached copy. API calls are never cached here: the app's local database holds data.
const CACHE = 'tessera-shell-v1';

// Everything the web export holds (list written by scripts/buildWeb.mjs) is cached at install, so
// one visit is enough for the app to start with the server down.
self.addEventListener('install', (event) => {
  event.waitUntil(
    fetch('/precache.json', { cache: 'no-store' })
      .then((res) => (res.ok ? res.json() : { files: [] }))
      .then(({ files }) => caches.open(CACHE).then((cache) => Promise.all(files.map((f) => cache.add(f).catch(() => undefined)))))
      .catch(() => undefined)
      .then(() => self.skipWaiting()),
  );
});
self.addEventListener('activate', (event) => event.waitUntil(self.clients.claim()));

function cacheable(url) {
  const u = new URL(url);
  return u.origin === self.location.origin && !u.pathname.startsWith('/api/');
}

self.addEventListener('message', (event) => {
  const data = event.data || {};
  if (data.type !== 'cache-urls' || !Array.isArray(data.urls)) return;
  const urls = [...new Set(data.urls.filter(cacheable))];
  event.waitUntil(
    caches
      .open(CACHE)
      .then((cache) =>
        Promise.all(
          urls.map(async (url) => {
            // Already kept by the fetch handler? Then no second download.
            if (await cache.match(url, { ignoreVary: true })) return true;
            return cache.add(url).then(() => true, () => false);
          }),
        ),
      )
      .then((results) => {
        const cached = results.filter(Boolean).length;
        if (event.source) event.source.postMessage({ type: 'cached', cached, requested: urls.length });
      }),
  );
});

self.addEventListener('fetch', (event) => {
  const req = event.request;
  if (req.method !== 'GET' || !cacheable(req.url)) return;
  event.respondWith(
    fetch(req)
      .then((res) => {
        if (res.ok && res.type === 'basic') {
          const copy = res.clone();
          caches.open(CACHE).then((cache) => cache.put(req, copy));
        }
        return res;
      })
      .catch(async () => {
        const cache = await caches.open(CACHE);
        const hit = await cache.match(req, { ignoreVary: true });
        if (hit) return hit;
        // App routes all render from index.html.
        if (req.mode === 'navigate') {
          const shell = (await cache.match(self.location.origin + '/')) || (await cache.match('/index.html'));
          if (shell) return shell;
        }
        return new Response('offline', { status: 503, statusText: 'offline' });
      }),
  );
});
