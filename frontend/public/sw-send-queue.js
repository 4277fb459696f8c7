// Loaded into the service worker Workbox generates (vite.config.ts, workbox.importScripts).
// When the browser's Background Sync says the network is back, tell every open Shoalbook window to drain its
// send queue. The queue itself lives in the app (IndexedDB); the worker sends nothing on its own.
self.addEventListener('sync', (event) => {
  if (event.tag !== 'shoalbook-send-queue') return;
  event.waitUntil(
    self.clients
      .matchAll({ type: 'window', includeUncontrolled: true })
      .then((clients) => clients.forEach((client) => client.postMessage({ type: 'shoalbook-send-queue' }))),
  );
});
