/// <reference lib="webworker" />
// Spanlog service worker: event wiring only. Precaches the app shell (the list is injected at build time),
// answers every navigation with the cached index.html, and activates a new version only when the page asks
// (after the user agreed in the update bar).
import { clientsClaim } from 'workbox-core';
import { cleanupOutdatedCaches, createHandlerBoundToURL, precacheAndRoute } from 'workbox-precaching';
import { NavigationRoute, registerRoute } from 'workbox-routing';

declare const self: ServiceWorkerGlobalScope & {
  __WB_MANIFEST: (string | { url: string; revision: string | null })[];
};

precacheAndRoute(self.__WB_MANIFEST);
cleanupOutdatedCaches();
registerRoute(new NavigationRoute(createHandlerBoundToURL('index.html')));

// The first install takes control at once, so the very first visit already works offline. Later versions wait
// for SKIP_WAITING (see below) and then take control, which makes the page reload.
clientsClaim();

self.addEventListener('message', (event: ExtendableMessageEvent) => {
  if ((event.data as { type?: string } | null)?.type === 'SKIP_WAITING') void self.skipWaiting();
});
