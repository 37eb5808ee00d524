// Where the plan is computed: in the bundled Web Worker when one starts, on the main thread when none can
// (no Worker in this browser, a constructor that throws, or a worker script that fails to load). Either way
// the result is the engine's own planSite answer for the same file.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { generateDemoSite, planSite, seededRandom } from '../../shared/plan';
import type { SiteFile } from '../../shared/schemas/site-file';

vi.mock('react-native', () => ({ Platform: { OS: 'web' } }));

const file: SiteFile = generateDemoSite({ supports: 6, random: seededRandom(11) });
const expected = JSON.parse(JSON.stringify(planSite(file)));
const load = async () => {
  vi.resetModules();
  return import('./plan-compute');
};

type Listener = { onmessage: ((e: { data: unknown }) => void) | null; onerror: ((e: { preventDefault?: () => void }) => void) | null };
const made: { url: string; posted: unknown[]; terminated: boolean }[] = [];

/** A stand-in for the browser's Worker: `behaviour` decides whether it plans, fails to load, or cannot be made. */
function fakeWorker(behaviour: 'plans' | 'fails-to-load' | 'throws') {
  return class implements Listener {
    onmessage: Listener['onmessage'] = null;
    onerror: Listener['onerror'] = null;
    private rec: (typeof made)[number];
    constructor(url: string) {
      if (behaviour === 'throws') throw new Error('SecurityError: workers are disabled');
      this.rec = { url, posted: [], terminated: false };
      made.push(this.rec);
    }
    postMessage(m: { v: number; id: number; file: SiteFile }) {
      this.rec.posted.push(m);
      setTimeout(() => {
        if (behaviour === 'fails-to-load') this.onerror?.({ preventDefault: () => undefined });
        else this.onmessage?.({ data: { v: m.v, id: m.id, type: 'planned', result: planSite(m.file) } });
      }, 5);
    }
    terminate() {
      this.rec.terminated = true;
    }
  };
}

describe('computePlan chooses the worker or the main-thread fallback', () => {
  beforeEach(() => {
    made.length = 0;
  });
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('with no Worker in the browser it plans on the main thread and gives the same ranked candidates as planSite', async () => {
    expect(expected.antennas.length).toBeGreaterThan(0);
    expect(expected.antennas[0].ranked.length).toBeGreaterThan(0);
    vi.stubGlobal('Worker', undefined);
    const m = await load();
    const result = await m.computePlan(file);
    expect(JSON.parse(JSON.stringify(result))).toEqual(expected);
    expect(m.planComputedIn()).toBe('main-thread');
  });

  it('when the Worker constructor throws it plans on the main thread', async () => {
    vi.stubGlobal('Worker', fakeWorker('throws'));
    const m = await load();
    expect(JSON.parse(JSON.stringify(await m.computePlan(file)))).toEqual(expected);
    expect(m.planComputedIn()).toBe('main-thread');
  });

  it('when /plan-worker.js fails to load it retries the waiting plan on the main thread and never starts another worker', async () => {
    vi.stubGlobal('Worker', fakeWorker('fails-to-load'));
    const m = await load();
    expect(JSON.parse(JSON.stringify(await m.computePlan(file)))).toEqual(expected);
    expect(made).toHaveLength(1);
    expect(made[0]!.url).toBe('/plan-worker.js');
    expect(made[0]!.terminated).toBe(true);
    expect(m.planComputedIn()).toBe('main-thread');
    await m.computePlan(file);
    expect(made).toHaveLength(1);
  });

  it('with a working Worker the plan is computed there (the request carries the file) and says so', async () => {
    vi.stubGlobal('Worker', fakeWorker('plans'));
    const m = await load();
    expect(JSON.parse(JSON.stringify(await m.computePlan(file)))).toEqual(expected);
    expect(made).toHaveLength(1);
    expect(made[0]!.posted).toEqual([expect.objectContaining({ type: 'plan', file })]);
    expect(m.planComputedIn()).toBe('worker');
  });
});
