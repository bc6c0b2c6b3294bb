// Registers the service worker (production builds only) and tells the page when a new version is waiting.
// The page decides when to apply it: never over a half-typed reading.
import { Workbox } from 'workbox-window';

export interface UpdateHandle {
  /** Activates the waiting version, then reloads once it controls the page. */
  apply: () => void;
}

export function registerServiceWorker(onUpdateWaiting: (handle: UpdateHandle) => void): void {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  const workbox = new Workbox('./service-worker.js');
  workbox.addEventListener('waiting', () => {
    onUpdateWaiting({
      apply: () => {
        workbox.addEventListener('controlling', () => window.location.reload());
        workbox.messageSkipWaiting();
      },
    });
  });
  workbox.register().catch((error: unknown) => {
    console.warn('Service worker registration failed; the app still works while online.', error);
  });
}
