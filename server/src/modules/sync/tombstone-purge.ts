// While the server runs it purges tombstones older than the configured keep time: once shortly after start and
// then every few hours. Purging moves each club's horizon, so a phone that was away longer than that resyncs
// (tombstones.ts). Runs never overlap; a failed run is logged and the next one tries again.
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Clock } from '../../app-deps';
import { purgeTombstones } from './tombstones';

const DAY_MS = 24 * 3600_000;

export type TombstonePurgeOptions = {
  keepDays: number;
  /** Time between runs; six hours by default. */
  everyMs?: number;
  /** Delay of the first run after start (lets the start finish first); one minute by default. */
  firstAfterMs?: number;
  clock: Clock;
  logger: Logger;
};

export type TombstonePurge = {
  /** One purge now (waits for a run already going); resolves with the number removed per club. */
  runNow(): Promise<Map<string, number>>;
  stop(): Promise<void>;
};

export function scheduleTombstonePurge(dataSource: DataSource, opts: TombstonePurgeOptions): TombstonePurge {
  const everyMs = opts.everyMs ?? 6 * 3600_000;
  let running: Promise<Map<string, number>> | null = null;
  let stopped = false;

  const runNow = async (): Promise<Map<string, number>> => {
    while (running) await running.catch(() => undefined);
    const before = new Date(opts.clock.now().getTime() - opts.keepDays * DAY_MS);
    running = purgeTombstones(dataSource, before);
    try {
      const counts = await running;
      const removed = [...counts.values()].reduce((a, b) => a + b, 0);
      if (removed > 0) opts.logger.info({ removed, clubs: counts.size, before: before.toISOString() }, 'tombstones purged');
      return counts;
    } finally {
      running = null;
    }
  };

  const tick = () => {
    if (stopped) return;
    runNow().catch((err: unknown) => opts.logger.warn({ err }, 'tombstone purge failed; the next run tries again'));
  };
  const first = setTimeout(tick, opts.firstAfterMs ?? 60_000);
  const timer = setInterval(tick, everyMs);
  first.unref();
  timer.unref();

  return {
    runNow,
    async stop() {
      stopped = true;
      clearTimeout(first);
      clearInterval(timer);
      if (running) await running.catch(() => undefined);
    },
  };
}
