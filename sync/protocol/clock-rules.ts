import { decodeHlc, encodeHlc } from './hlc';

/**
 * How far ahead of the server's own time a client clock may be before the server pulls it back.
 * A phone whose clock runs a day fast would otherwise win every edit for a day.
 */
export const MAX_CLOCK_AHEAD_MS = 60_000;

/**
 * The clock the server records for a mutation. A clock more than MAX_CLOCK_AHEAD_MS ahead of the server is
 * moved back to that bound, keeping its counter and node so that one device's edits keep their order and
 * nodes still break ties. Two edits from one device that clamp to the same clock are ordered by mutation id
 * (the server applies them in that order and a tie goes to the later one).
 */
export function clampClock(clock: string, serverNowMs: number): { clock: string; clamped: boolean } {
  const p = decodeHlc(clock);
  const bound = Math.floor(serverNowMs) + MAX_CLOCK_AHEAD_MS;
  if (p.wallMs <= bound) return { clock, clamped: false };
  return { clock: encodeHlc({ wallMs: bound, counter: p.counter, node: p.node }), clamped: true };
}
