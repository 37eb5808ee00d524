/*
 * One tab syncing at a time. With the Web Locks API (navigator.locks) the tab that holds the lock syncs and the
 * others skip. Without it, tabs elect a leader over a BroadcastChannel: each announces itself every few seconds
 * and the tab with the smallest id among those heard recently syncs. With neither (Node, tests) it always runs.
 */

interface LockManagerLike {
  request(name: string, options: { ifAvailable: boolean }, callback: (lock: unknown) => Promise<unknown>): Promise<unknown>;
}

interface ChannelLike {
  postMessage(message: unknown): void;
  addEventListener(type: 'message', listener: (event: { data: unknown }) => void): void;
  close(): void;
}

export interface TabLeaderEnv {
  locks?: LockManagerLike;
  createChannel?: (name: string) => ChannelLike;
  nowMs: () => number;
  tabId: string;
  setInterval?: (fn: () => void, ms: number) => unknown;
  clearInterval?: (handle: unknown) => void;
}

export interface TabLeader {
  /** Runs `fn` if this tab may sync now; returns false when another tab is syncing or leads. */
  runExclusive(fn: () => Promise<void>): Promise<boolean>;
  close(): void;
}

const HEARTBEAT_MS = 2_000;
const STALE_MS = 5_000;

export function createTabLeader(name: string, env: TabLeaderEnv): TabLeader {
  if (env.locks) {
    const locks = env.locks;
    return {
      async runExclusive(fn) {
        let ran = false;
        await locks.request(name, { ifAvailable: true }, async (lock) => {
          if (!lock) return;
          ran = true;
          await fn();
        });
        return ran;
      },
      close() {},
    };
  }
  if (env.createChannel && env.setInterval && env.clearInterval) {
    const channel = env.createChannel(name);
    const seen = new Map<string, number>();
    const announce = () => channel.postMessage({ type: 'tab-alive', tabId: env.tabId });
    channel.addEventListener('message', (event) => {
      const d = event.data as { type?: string; tabId?: string } | null;
      if (d?.type === 'tab-alive' && typeof d.tabId === 'string') {
        // A newcomer learns of us at once instead of at our next heartbeat.
        const isNew = !seen.has(d.tabId);
        seen.set(d.tabId, env.nowMs());
        if (isNew) announce();
      }
      if (d?.type === 'tab-gone' && typeof d.tabId === 'string') seen.delete(d.tabId);
    });
    announce();
    const timer = env.setInterval(announce, HEARTBEAT_MS);
    const clearTimer = env.clearInterval;
    return {
      async runExclusive(fn) {
        const now = env.nowMs();
        const alive = [...seen.entries()].filter(([, at]) => now - at < STALE_MS).map(([id]) => id);
        if (alive.some((id) => id < env.tabId)) return false;
        await fn();
        return true;
      },
      close() {
        clearTimer(timer);
        channel.postMessage({ type: 'tab-gone', tabId: env.tabId });
        channel.close();
      },
    };
  }
  return {
    async runExclusive(fn) {
      await fn();
      return true;
    },
    close() {},
  };
}
