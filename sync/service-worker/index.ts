/* The page's side of the service worker (the worker itself is sw.ts, built separately). */
export { applyUpdate, isUpdateWaiting, registerServiceWorker, serviceWorkerSupported, subscribeToUpdate, SERVICE_WORKER_URL } from './register';
