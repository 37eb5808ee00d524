import { decodeHlc, encodeHlc } from '../../../../sync/protocol';

/** Node id of clocks the REST API writes (sync clients use their device ids). */
export const REST_CLOCK_NODE = 'server-rest';

/**
 * The hybrid-logical-clock string stamped on fields written through the REST API: the server's time, but always
 * after every clock already on the record (a phone's clock may run up to a minute ahead of the server), so an
 * online edit wins over every edit the server has already seen, as "last writer wins" expects.
 */
export function restWriteClock(nowMs: number, existing: Iterable<string | null | undefined>): string {
  let wallMs = Math.floor(nowMs);
  let counter = 0;
  for (const clock of existing) {
    if (!clock) continue;
    const p = decodeHlc(clock);
    if (p.wallMs > wallMs || (p.wallMs === wallMs && p.counter >= counter)) {
      wallMs = p.wallMs;
      counter = p.counter + 1;
    }
  }
  return encodeHlc({ wallMs, counter, node: REST_CLOCK_NODE });
}
