import { backoffDelayMs, DEFAULT_BACKOFF, type BackoffOptions } from './backoff';

/*
 * When to sync: now (start, back online, tab visible again, syncNow), shortly after local writes (debounced),
 * every `intervalMs`, and after a failure with exponential backoff and jitter. Runs never overlap: a request
 * during a run makes one more run afterwards.
 */

export interface Timers {
  setTimeout(fn: () => void, ms: number): unknown;
  clearTimeout(handle: unknown): void;
}

export const realTimers: Timers = {
  setTimeout: (fn, ms) => globalThis.setTimeout(fn, ms),
  clearTimeout: (h) => globalThis.clearTimeout(h as ReturnType<typeof setTimeout>),
};

export interface SchedulerOptions {
  run: () => Promise<void>;
  /** Called after each run with its failure (or null); answer true if the failure is worth retrying. */
  onOutcome: (error: unknown | null) => boolean;
  random: () => number;
  timers: Timers;
  debounceMs: number;
  intervalMs: number;
  backoff?: BackoffOptions;
}

export interface Scheduler {
  /** Sync as soon as possible; resolves when a run that started after this call has finished. */
  now(): Promise<void>;
  /** Sync after a quiet period (after local writes). */
  soon(): void;
  start(): void;
  stop(): void;
}

export function createScheduler(opts: SchedulerOptions): Scheduler {
  let running: Promise<void> | null = null;
  let again = false;
  let attempt = 0;
  let timer: unknown = null;
  let stopped = true;
  let waiters: (() => void)[] = [];

  const schedule = (ms: number) => {
    if (stopped) return;
    if (timer !== null) opts.timers.clearTimeout(timer);
    timer = opts.timers.setTimeout(() => {
      timer = null;
      void kick();
    }, ms);
  };

  const kick = (): Promise<void> => {
    if (running) {
      again = true;
      return new Promise<void>((ok) => waiters.push(ok));
    }
    running = (async () => {
      do {
        again = false;
        const done = waiters;
        waiters = [];
        let error: unknown | null = null;
        try {
          await opts.run();
        } catch (err) {
          error = err;
        }
        const retry = opts.onOutcome(error);
        if (error === null) {
          attempt = 0;
          schedule(opts.intervalMs);
        } else if (retry) {
          schedule(backoffDelayMs(attempt++, opts.random, opts.backoff ?? DEFAULT_BACKOFF));
        } else {
          schedule(opts.intervalMs);
        }
        for (const ok of done) ok();
      } while (again);
      running = null;
    })();
    return running;
  };

  return {
    now: kick,
    soon() {
      schedule(opts.debounceMs);
    },
    start() {
      stopped = false;
      void kick();
    },
    stop() {
      stopped = true;
      if (timer !== null) opts.timers.clearTimeout(timer);
      timer = null;
    },
  };
}
