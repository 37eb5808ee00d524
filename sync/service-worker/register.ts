import { Workbox } from 'workbox-window';

/*
 * Registers the service worker (production web builds only; `expo start` serves a development build whose
 * bundle changes on every edit, and a worker would keep serving the old one) and tracks whether a new version is
 * installed and waiting. The worker lives at /sw.js so that it controls the whole origin.
 */

export const SERVICE_WORKER_URL = '/sw.js';

type Listener = () => void;
const listeners = new Set<Listener>();
let workbox: Workbox | null = null;
let updateWaiting = false;
let reloadWhenControlled = false;

export function serviceWorkerSupported(): boolean {
  return typeof window !== 'undefined' && typeof navigator !== 'undefined' && 'serviceWorker' in navigator;
}

/** Registers once; later calls do nothing. Returns false when this build or browser does not use a worker. */
export function registerServiceWorker(isProduction: boolean = process.env.NODE_ENV === 'production'): boolean {
  if (workbox) return true;
  if (!isProduction || !serviceWorkerSupported()) return false;
  workbox = new Workbox(SERVICE_WORKER_URL, { scope: '/' });
  workbox.addEventListener('waiting', () => {
    updateWaiting = true;
    for (const l of listeners) l();
  });
  workbox.addEventListener('controlling', () => {
    // Only after the person chose to update: the first install also takes control, and must not reload.
    if (reloadWhenControlled) window.location.reload();
  });
  void workbox.register().catch(() => {
    // Registration fails on insecure origins (http on a LAN address) and in private modes: the app still runs,
    // it just will not open without a network. Nothing to tell the person at this point.
  });
  return true;
}

export function isUpdateWaiting(): boolean {
  return updateWaiting;
}

export function subscribeToUpdate(listener: Listener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** Activates the waiting version; the page reloads once it has taken control. */
export function applyUpdate(): void {
  if (!workbox || !updateWaiting) return;
  reloadWhenControlled = true;
  workbox.messageSkipWaiting();
}
