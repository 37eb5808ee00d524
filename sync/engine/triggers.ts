/*
 * The browser events that start a sync: the network coming back (`online`), the person returning to the tab
 * (`visibilitychange` to visible). Passed in as an environment so that Node tests and native builds can run
 * without a window.
 */

interface EventTargetLike {
  addEventListener(type: string, listener: () => void): void;
  removeEventListener(type: string, listener: () => void): void;
}

export interface TriggerEnv {
  window?: EventTargetLike;
  document?: EventTargetLike & { visibilityState?: string };
  navigator?: { onLine?: boolean };
}

export function browserTriggerEnv(): TriggerEnv {
  const g = globalThis as unknown as { window?: EventTargetLike; document?: TriggerEnv['document']; navigator?: TriggerEnv['navigator'] };
  return { window: g.window, document: g.document, navigator: g.navigator };
}

export function wireTriggers(env: TriggerEnv, handlers: { onOnline: () => void; onOffline: () => void; onVisible: () => void }): () => void {
  const online = () => handlers.onOnline();
  const offline = () => handlers.onOffline();
  const visible = () => {
    if (env.document?.visibilityState === 'visible') handlers.onVisible();
  };
  env.window?.addEventListener('online', online);
  env.window?.addEventListener('offline', offline);
  env.document?.addEventListener('visibilitychange', visible);
  return () => {
    env.window?.removeEventListener('online', online);
    env.window?.removeEventListener('offline', offline);
    env.document?.removeEventListener('visibilitychange', visible);
  };
}
