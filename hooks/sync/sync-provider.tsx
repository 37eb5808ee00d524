import { createContext, useContext, useEffect, useState, type ReactNode } from 'react';
import { API_BASE, apiFetch } from '@/hooks/api/client';
import { tokenStore } from '@/hooks/api/token-store';
import { useSession } from '@/hooks/auth/use-session';
import {
  browserTriggerEnv,
  createFetchTransport,
  createMemoryStore,
  createSyncClient,
  idbDatabaseName,
  openIdbStore,
  randomId,
  requestPersistentStorage,
  type LocalStore,
  type SyncClient,
  type SyncClientOptions,
} from '@/sync';

/*
 * The sync client of the signed-in person and the current club, for the screens below it. On the web the
 * records live in IndexedDB (one database per person and club); where IndexedDB is missing (native builds for
 * now) they are kept in memory and the indicator says so.
 */

interface SyncContextValue {
  client: SyncClient | null;
  /** Why the local database could not be opened (private browsing, storage blocked), in plain words. */
  openError: string | null;
  /** false when records are only in memory (lost when the app closes). */
  durable: boolean;
}

const SyncContext = createContext<SyncContextValue>({ client: null, openError: null, durable: true });

export function useSyncContext(): SyncContextValue {
  return useContext(SyncContext);
}


async function accessToken({ refresh }: { refresh: boolean }): Promise<string | null> {
  // apiFetch refreshes the tokens when the server answers 401; asking for /api/me is the cheapest way to get that.
  if (refresh) await apiFetch('/api/me').catch(() => undefined);
  return tokenStore.get()?.accessToken ?? null;
}

/** Web Locks and BroadcastChannel where the browser has them: one tab syncs, every tab hears of changes. */
function browserTabs(): NonNullable<SyncClientOptions['tabs']> & { createChannel?: SyncClientOptions['createChannel'] } {
  const g = globalThis as unknown as { navigator?: { locks?: NonNullable<SyncClientOptions['tabs']>['locks'] }; BroadcastChannel?: typeof BroadcastChannel };
  const Channel = g.BroadcastChannel;
  return {
    locks: g.navigator?.locks,
    createChannel: Channel ? (name) => new Channel(name) as unknown as ReturnType<NonNullable<SyncClientOptions['createChannel']>> : undefined,
    setInterval: (fn, ms) => setInterval(fn, ms),
    clearInterval: (h) => clearInterval(h as ReturnType<typeof setInterval>),
    tabId: `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`,
  };
}

export function SyncProvider({ clubId, children }: { clubId: string; children: ReactNode }) {
  const { user } = useSession();
  const userId = user?.id ?? null;
  const [value, setValue] = useState<SyncContextValue>({ client: null, openError: null, durable: true });

  useEffect(() => {
    if (!userId) return;
    let live = true;
    let client: SyncClient | null = null;
    let store: LocalStore | null = null;
    (async () => {
      const durable = typeof indexedDB !== 'undefined';
      store = durable ? await openIdbStore({ name: idbDatabaseName(userId, clubId) }) : createMemoryStore();
      let deviceId = (await store.getMeta()).deviceId;
      if (!deviceId) {
        deviceId = randomId();
        await store.setMeta({ deviceId });
      }
      const tabs = browserTabs();
      client = await createSyncClient({
        store,
        transport: createFetchTransport({ baseUrl: API_BASE, clubId, getAccessToken: accessToken }),
        clock: { nowMs: () => Date.now() },
        random: Math.random,
        deviceId,
        clubId,
        triggers: browserTriggerEnv(),
        tabs,
        createChannel: tabs.createChannel,
      });
      if (!live) {
        await client.stop();
        await store.close();
        return;
      }
      setValue({ client, openError: null, durable });
      await client.start();
      client.setStoragePersisted(await requestPersistentStorage());
    })().catch((err: unknown) => {
      if (!live) return;
      const detail = err instanceof Error ? err.message : String(err);
      setValue({ client: null, durable: false, openError: `Loftline could not open its storage on this device (${detail}). Changes cannot be kept offline until this is fixed; private browsing often causes it.` });
    });
    return () => {
      live = false;
      const c = client;
      const s = store;
      setValue({ client: null, openError: null, durable: true });
      if (c) void c.stop().then(() => s?.close());
    };
  }, [userId, clubId]);

  return <SyncContext.Provider value={value}>{children}</SyncContext.Provider>;
}
