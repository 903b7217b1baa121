/*
 * Starproof kiosk service worker (scope /kiosk). Keeps the player itself (its HTML, hashed scripts,
 * styles and fonts) and the slide images so a screen keeps playing, even after a reload, while the
 * network or the server is down. The feed is not handled here: the player revalidates it itself
 * and keeps the last good one.
 */
const SHELL = 'starproof-kiosk-shell-v1';
const MEDIA = 'starproof-kiosk-media';

self.addEventListener('install', () => self.skipWaiting());
self.addEventListener('activate', (event) => {
  event.waitUntil(
    caches
      .keys()
      .then((names) => Promise.all(names.filter((n) => n.startsWith('starproof-kiosk-shell-') && n !== SHELL).map((n) => caches.delete(n))))
      .then(() => self.clients.claim()),
  );
});

/** Cache first: for files whose name changes with their content (hashed assets, image renditions). */
async function cacheFirst(cacheName, request) {
  const cache = await caches.open(cacheName);
  const hit = await cache.match(request);
  if (hit) return hit;
  const response = await fetch(request);
  if (response.ok) await cache.put(request, response.clone());
  return response;
}

/** Network first, the saved copy when offline: for the player's HTML, so a new version arrives. */
async function networkFirst(request) {
  const cache = await caches.open(SHELL);
  try {
    const response = await fetch(request);
    if (response.ok) await cache.put('/kiosk', response.clone());
    return response;
  } catch (error) {
    const saved = await cache.match('/kiosk');
    if (saved) return saved;
    throw error;
  }
}

self.addEventListener('fetch', (event) => {
  const url = new URL(event.request.url);
  if (event.request.method !== 'GET' || url.origin !== self.location.origin) return;
  if (event.request.mode === 'navigate' && url.pathname === '/kiosk') event.respondWith(networkFirst(event.request));
  else if (url.pathname.startsWith('/assets/')) event.respondWith(cacheFirst(SHELL, event.request));
  else if (url.pathname.startsWith('/media/files/')) event.respondWith(cacheFirst(MEDIA, event.request));
});
