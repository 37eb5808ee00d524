// A network that misbehaves on purpose, for the sync tests: it drops requests before they reach the server,
// drops answers after the server has committed, delivers requests twice, and keeps copies of requests to deliver
// late (out of order, after newer ones). Every decision comes from the seeded random source.
import { TransportError, type PullRequest, type PushRequest, type SyncTransport } from '../../../sync/protocol';

export interface FaultRates {
  dropRequest: number;
  dropResponse: number;
  duplicate: number;
  /** Chance to keep a copy of a push for late delivery, and to deliver one of the kept copies before a request. */
  delay: number;
}

export const NO_FAULTS: FaultRates = { dropRequest: 0, dropResponse: 0, duplicate: 0, delay: 0 };

export interface FaultLog {
  droppedRequests: number;
  droppedResponses: number;
  duplicates: number;
  lateDeliveries: number;
}

export interface FaultyTransport extends SyncTransport {
  rates: FaultRates;
  log: FaultLog;
  /** Called with each push actually delivered to the server (first or repeated), before it is sent. */
  onDeliver?: (req: PushRequest) => void;
  /** Deliver every kept late copy now (their answers are thrown away). */
  flushLate(): Promise<void>;
}

export function faultyTransport(inner: SyncTransport, random: () => number, rates: FaultRates = NO_FAULTS): FaultyTransport {
  const late: PushRequest[] = [];
  const log: FaultLog = { droppedRequests: 0, droppedResponses: 0, duplicates: 0, lateDeliveries: 0 };
  const self: FaultyTransport = {
    rates,
    log,
    async flushLate() {
      while (late.length > 0) await deliverLate(late.shift()!);
    },
    push: (req) => wrap(req, (r) => deliverPush(r)),
    pull: (req) => wrap(req, (r: PullRequest) => inner.pull(r)),
  };
  const deliverPush = (req: PushRequest) => {
    self.onDeliver?.(req);
    return inner.push(req);
  };
  async function deliverLate(req: PushRequest) {
    log.lateDeliveries += 1;
    try {
      await deliverPush(req);
    } catch {
      // a late copy's fate does not matter to anyone
    }
  }
  async function wrap<Q extends PushRequest | PullRequest, A>(req: Q, send: (r: Q) => Promise<A>): Promise<A> {
    if (late.length > 0 && random() < self.rates.delay) await deliverLate(late.splice(Math.floor(random() * late.length), 1)[0]);
    if (req.type === 'push' && random() < self.rates.delay) late.push(structuredClone(req as PushRequest));
    if (random() < self.rates.dropRequest) {
      log.droppedRequests += 1;
      throw new TransportError('offline', 'simulated: request lost');
    }
    let answer = await send(req);
    if (random() < self.rates.duplicate) {
      log.duplicates += 1;
      answer = await send(structuredClone(req));
    }
    if (random() < self.rates.dropResponse) {
      log.droppedResponses += 1;
      throw new TransportError('offline', 'simulated: answer lost after the server committed');
    }
    return answer;
  }
  return self;
}

/** The project's seeded generator (mulberry32), shared with the planning engine. */
export { seededRandom } from '../../../shared/plan/random';

/** A UUID (version-4 layout) drawn from a seeded generator, so replays create the same ids. */
export function seededUuid(random: () => number): string {
  const hex = () => Math.floor(random() * 16).toString(16);
  const s = Array.from({ length: 32 }, hex);
  s[12] = '4';
  s[16] = '89ab'[Math.floor(random() * 4)];
  const j = s.join('');
  return `${j.slice(0, 8)}-${j.slice(8, 12)}-${j.slice(12, 16)}-${j.slice(16, 20)}-${j.slice(20)}`;
}
