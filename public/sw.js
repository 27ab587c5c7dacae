// Tessera offline shell: network first for everything of our own origin except the API, falling
// back to the cached copy. API calls are never cached here: the app's local database holds data.
const CACHE = 'tessera-shell-v1';

self.addEventListener('install', () => self.skipWaiting());
self.addEventListener('activate', (event) => event.waitUntil(self.clients.claim()));

function cacheable(url) {
  const u = new URL(url);
  return u.origin === self.location.origin && !u.pathname.startsWith('/api/');
}

self.addEventListener('message', (event) => {
  const data = event.data || {};
  if (data.type !== 'cache-urls' || !Array.isArray(data.urls)) return;
  event.waitUntil(
    caches.open(CACHE).then((cache) =>
      Promise.all(data.urls.filter(cacheable).map((url) => cache.add(url).catch(() => undefined))),
    ),
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
