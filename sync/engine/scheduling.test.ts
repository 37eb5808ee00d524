import { describe, expect, it } from 'vitest';
import { backoffDelayMs } from './backoff';
import { createScheduler, type Timers } from './scheduler';
import { createTabLeader } from './tab-leader';

class FakeTimers implements Timers {
  pending: { fn: () => void; ms: number; id: number }[] = [];
  private next = 1;
  setTimeout(fn: () => void, ms: number) {
    const id = this.next++;
    this.pending.push({ fn, ms, id });
    return id;
  }
  clearTimeout(h: unknown) {
    this.pending = this.pending.filter((p) => p.id !== h);
  }
  fire() {
    const p = this.pending.shift();
    p?.fn();
    return p?.ms;
  }
}

describe('exponential backoff with jitter (common practice: "full jitter" family, capped)', () => {
  it('waits between half and all of base·2ⁿ, capped, as the random source decides', () => {
    const opts = { baseMs: 1_000, maxMs: 60_000 };
    expect(backoffDelayMs(0, () => 0, opts)).toBe(500);
    expect(backoffDelayMs(0, () => 0.999999, opts)).toBe(1_000);
    expect(backoffDelayMs(3, () => 0.5, opts)).toBe(6_000);
    expect(backoffDelayMs(20, () => 0.999999, opts)).toBe(60_000);
  });
});

describe('sync scheduler', () => {
  it('coalesces requests made during a run into one more run, then waits the interval', async () => {
    const timers = new FakeTimers();
    let runs = 0;
    let release: () => void = () => undefined;
    const s = createScheduler({
      run: () => {
        runs += 1;
        return new Promise<void>((ok) => (release = ok));
      },
      onOutcome: () => true,
      random: () => 0.5,
      timers,
      debounceMs: 1_500,
      intervalMs: 60_000,
    });
    s.start();
    const a = s.now();
    const b = s.now();
    release();
    await Promise.resolve();
    await new Promise((ok) => setTimeout(ok, 0));
    release();
    await Promise.all([a, b]);
    expect(runs).toBe(2);
    expect(timers.pending.map((p) => p.ms)).toEqual([60_000]);
  });

  it('backs off after failures and resets after a success', async () => {
    const timers = new FakeTimers();
    let fail = true;
    const s = createScheduler({
      run: async () => {
        if (fail) throw new Error('offline');
      },
      onOutcome: (e) => e !== null,
      random: () => 0.999999,
      timers,
      debounceMs: 1_500,
      intervalMs: 60_000,
      backoff: { baseMs: 1_000, maxMs: 300_000 },
    });
    s.start();
    await s.now();
    const delays: number[] = [];
    for (let i = 0; i < 3; i++) {
      delays.push(timers.pending[0].ms);
      timers.fire();
      await new Promise((ok) => setTimeout(ok, 0));
    }
    expect(delays).toEqual([2_000, 4_000, 8_000]);
    fail = false;
    timers.fire();
    await new Promise((ok) => setTimeout(ok, 0));
    expect(timers.pending.map((p) => p.ms)).toEqual([60_000]);
  });

  it('debounces syncs after local writes', () => {
    const timers = new FakeTimers();
    const s = createScheduler({ run: async () => undefined, onOutcome: () => false, random: () => 0, timers, debounceMs: 1_500, intervalMs: 60_000 });
    s.start();
    timers.pending = [];
    s.soon();
    s.soon();
    s.soon();
    expect(timers.pending.map((p) => p.ms)).toEqual([1_500]);
  });
});

describe('one tab syncing at a time', () => {
  it('with Web Locks, skips while another tab holds the lock', async () => {
    const held = new Set<string>();
    const locks = {
      async request(name: string, _o: { ifAvailable: boolean }, cb: (lock: unknown) => Promise<unknown>) {
        if (held.has(name)) return cb(null);
        held.add(name);
        try {
          return await cb({ name });
        } finally {
          held.delete(name);
        }
      },
    };
    const a = createTabLeader('sync', { locks, nowMs: () => 0, tabId: 'a' });
    const b = createTabLeader('sync', { locks, nowMs: () => 0, tabId: 'b' });
    let bRan: boolean | null = null;
    const aRan = await a.runExclusive(async () => {
      bRan = await b.runExclusive(async () => undefined);
    });
    expect(aRan).toBe(true);
    expect(bRan).toBe(false);
  });

  it('without Web Locks, the tab with the smallest id heard recently leads over a BroadcastChannel', async () => {
    const listeners: ((e: { data: unknown }) => void)[] = [];
    const createChannel = () => {
      let mine: ((e: { data: unknown }) => void) | null = null;
      return {
        postMessage: (m: unknown) => listeners.filter((l) => l !== mine).forEach((l) => l({ data: m })),
        addEventListener: (_t: 'message', l: (e: { data: unknown }) => void) => {
          mine = l;
          listeners.push(l);
        },
        close: () => undefined,
      };
    };
    const env = { createChannel, nowMs: () => 1_000, setInterval: () => 0, clearInterval: () => undefined };
    const a = createTabLeader('sync', { ...env, tabId: 'tab-a' });
    const b = createTabLeader('sync', { ...env, tabId: 'tab-b' });
    expect(await b.runExclusive(async () => undefined)).toBe(false);
    expect(await a.runExclusive(async () => undefined)).toBe(true);
    a.close();
    expect(await b.runExclusive(async () => undefined)).toBe(true);
  });
});
