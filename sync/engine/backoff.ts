/**
 * Exponential backoff with jitter: the n-th retry waits between half and all of base·2ⁿ (capped), so that many
 * phones coming back into coverage at once do not retry in step. `random` returns [0, 1) and is injected.
 */
export interface BackoffOptions {
  baseMs: number;
  maxMs: number;
}

export const DEFAULT_BACKOFF: BackoffOptions = { baseMs: 1_000, maxMs: 5 * 60_000 };

export function backoffDelayMs(attempt: number, random: () => number, opts: BackoffOptions = DEFAULT_BACKOFF): number {
  const ceiling = Math.min(opts.maxMs, opts.baseMs * 2 ** Math.max(0, Math.min(attempt, 30)));
  return Math.round(ceiling * (0.5 + 0.5 * random()));
}
