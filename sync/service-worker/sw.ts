/*
 * Loftline's service worker (built by server/src/dev/build-service-worker.ts after `expo export`).
 * - Precaches the app shell: index.html, the JS bundles, fonts, icons, the manifest. After one visit the app
 *   opens with no network; the person's records and photos live in IndexedDB, not here.
 * - Any page address (/sites/…, /invite/…) is answered with the cached index.html: the app routes on the client.
 * - /api is network only: answers carry a person's data and were fetched with their token; caching them here
 *   would keep them past sign-out and serve stale data as if it were live.
 * - A new version waits until the person accepts the update prompt ("SKIP_WAITING"), so a survey in progress is
 *   never reloaded under their fingers.
 */
import { z } from 'zod';
import { clientsClaim } from 'workbox-core';
import { cleanupOutdatedCaches, createHandlerBoundToURL, precacheAndRoute } from 'workbox-precaching';
import { NavigationRoute, registerRoute } from 'workbox-routing';
import { NetworkOnly } from 'workbox-strategies';

// The parts of ServiceWorkerGlobalScope used here (this file is also type-checked with the DOM library).
interface WorkerScope {
  __WB_MANIFEST: { url: string; revision: string | null }[];
  skipWaiting(): Promise<void>;
  addEventListener(type: 'message', listener: (event: { data: unknown }) => void): void;
}
declare const self: WorkerScope;

/** Messages a page may send; anything else is ignored. */
const workerMessageSchema = z.discriminatedUnion('type', [z.object({ type: z.literal('SKIP_WAITING') })]);

precacheAndRoute(self.__WB_MANIFEST);
cleanupOutdatedCaches();

registerRoute(({ url }) => url.pathname.startsWith('/api/'), new NetworkOnly(), 'GET');

registerRoute(new NavigationRoute(createHandlerBoundToURL('/index.html'), { denylist: [/^\/api\//] }));

self.addEventListener('message', (event) => {
  const message = workerMessageSchema.safeParse(event.data);
  if (message.success && message.data.type === 'SKIP_WAITING') void self.skipWaiting();
});

// The first version takes control of the page that installed it, so that page's later requests (fonts, lazy
// bundles) are served from the cache too.
clientsClaim();
