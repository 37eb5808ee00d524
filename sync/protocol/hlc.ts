import { z } from 'zod';

/*
 * Hybrid logical clock (Kulkarni et al., "Logical Physical Clocks", 2014): wall milliseconds, a counter that
 * orders events within one millisecond (or while the wall clock stands still or runs backwards), and the node id
 * of the device that made the event. The string form sorts lexicographically in the clock's total order:
 * fixed-width wall and counter, then the node id as the final tie-break.
 */

const WALL_DIGITS = 15;
const COUNTER_DIGITS = 6;
const COUNTER_MAX = 999_999;
export const HLC_NODE_PATTERN = /^[A-Za-z0-9_-]{1,64}$/;
const HLC_PATTERN = /^(\d{15})-(\d{6})-([A-Za-z0-9_-]{1,64})$/;

export const hlcStringSchema = z.string().regex(HLC_PATTERN, 'clock must be a hybrid logical clock string');
export const hlcNodeSchema = z.string().regex(HLC_NODE_PATTERN, 'node id must be 1–64 letters, digits, - or _');

export interface HlcParts {
  wallMs: number;
  counter: number;
  node: string;
}

export function encodeHlc(parts: HlcParts): string {
  if (!Number.isSafeInteger(parts.wallMs) || parts.wallMs < 0) throw new Error(`bad clock wall time ${parts.wallMs}`);
  if (!Number.isInteger(parts.counter) || parts.counter < 0 || parts.counter > COUNTER_MAX) throw new Error(`bad clock counter ${parts.counter}`);
  if (!HLC_NODE_PATTERN.test(parts.node)) throw new Error(`bad clock node ${parts.node}`);
  return `${String(parts.wallMs).padStart(WALL_DIGITS, '0')}-${String(parts.counter).padStart(COUNTER_DIGITS, '0')}-${parts.node}`;
}

export function decodeHlc(value: string): HlcParts {
  const m = HLC_PATTERN.exec(value);
  if (!m) throw new Error(`not a clock: ${value}`);
  return { wallMs: Number(m[1]), counter: Number(m[2]), node: m[3] };
}

/** Total order of clocks; null (never written) sorts before every clock. */
export function compareHlc(a: string | null | undefined, b: string | null | undefined): number {
  const x = a ?? '';
  const y = b ?? '';
  return x < y ? -1 : x > y ? 1 : 0;
}

export function maxHlc(a: string | null | undefined, b: string | null | undefined): string | null {
  return compareHlc(a, b) >= 0 ? (a ?? null) : (b ?? null);
}

export interface HybridClock {
  /** A new clock for a local event, later than every clock this node has made or seen. */
  tick(): string;
  /** Take a clock seen from elsewhere into account, so that later local events sort after it. */
  observe(remote: string | null | undefined): void;
  /** The latest clock made or seen (to persist across restarts). */
  last(): string | null;
}

export interface HybridClockOptions {
  node: string;
  /** Physical time source in epoch ms (already corrected by the server offset where known). */
  nowMs: () => number;
  /** Last clock persisted from a previous run, so that a restarted device never goes backwards. */
  last?: string | null;
  /** Remote clocks further than this ahead of our physical time are only followed up to this bound. */
  maxFutureMs: number;
}

export function createHybridClock(opts: HybridClockOptions): HybridClock {
  if (!HLC_NODE_PATTERN.test(opts.node)) throw new Error(`bad clock node ${opts.node}`);
  let wallMs = 0;
  let counter = 0;
  if (opts.last) {
    const p = decodeHlc(opts.last);
    wallMs = p.wallMs;
    counter = p.counter;
  }
  const advanceTo = (w: number, c: number) => {
    if (w > wallMs || (w === wallMs && c > counter)) {
      wallMs = w;
      counter = c;
    }
  };
  return {
    tick() {
      const phys = Math.floor(opts.nowMs());
      if (phys > wallMs) {
        wallMs = phys;
        counter = 0;
      } else if (counter >= COUNTER_MAX) {
        wallMs += 1;
        counter = 0;
      } else {
        counter += 1;
      }
      return encodeHlc({ wallMs, counter, node: opts.node });
    },
    observe(remote) {
      if (!remote) return;
      const p = decodeHlc(remote);
      const bound = Math.floor(opts.nowMs()) + opts.maxFutureMs;
      if (p.wallMs > bound) advanceTo(bound, 0);
      else advanceTo(p.wallMs, p.counter);
    },
    last() {
      return wallMs === 0 && counter === 0 ? null : encodeHlc({ wallMs, counter, node: opts.node });
    },
  };
}
