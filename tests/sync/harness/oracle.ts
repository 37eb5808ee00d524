// The fuzz's independent oracle: from every write a device acknowledged (committed to its own database) and the
// server time at which that write first reached the server, it computes what every record must end as.
// It re-derives the documented rules on its own (README "How sync behaves"), sharing no code with the server's
// merge: later clock wins per field (clocks more than MAX_CLOCK_AHEAD_MS ahead of the server at arrival are
// pulled back to that bound, keeping counter and node; a tie within one device goes to its later change); the
// deletion state is decided by the latest delete/undelete alone.
import type { OutboxDraft } from '../../../sync/store/types';

export interface AckedWrite {
  deviceId: string;
  mutationId: number;
  draft: OutboxDraft;
}

export interface ExpectedRecord {
  collection: string;
  id: string;
  fields: Record<string, unknown>;
  deleted: boolean;
}

const WALL = 15;

function pullBack(clock: string, serverMs: number, aheadMs: number): string {
  const wall = Number(clock.slice(0, WALL));
  const bound = serverMs + aheadMs;
  return wall > bound ? String(bound).padStart(WALL, '0') + clock.slice(WALL) : clock;
}

export class SyncOracle {
  readonly writes: AckedWrite[] = [];
  /** First server time each (device, mutation) was delivered at. */
  private readonly arrival = new Map<string, number>();
  private readonly deliveredUpTo = new Map<string, number>();

  constructor(private readonly aheadMs: number) {}

  acked(w: AckedWrite): void {
    this.writes.push(w);
  }

  /** A push reached the server at `serverMs`: every mutation of it not delivered before arrives now. */
  delivered(deviceId: string, mutationIds: number[], serverMs: number): void {
    let upTo = this.deliveredUpTo.get(deviceId) ?? 0;
    for (const id of [...mutationIds].sort((a, b) => a - b)) {
      if (id <= upTo) continue;
      this.arrival.set(`${deviceId}#${id}`, serverMs);
      upTo = id;
    }
    this.deliveredUpTo.set(deviceId, upTo);
  }

  expected(): Map<string, ExpectedRecord> {
    type Stamp = { clock: string; mutationId: number };
    const later = (a: Stamp, b: Stamp | undefined) => !b || a.clock > b.clock || (a.clock === b.clock && a.mutationId > b.mutationId);
    const state = new Map<string, { rec: ExpectedRecord; fieldStamp: Map<string, Stamp>; deleteStamp?: Stamp }>();
    for (const w of this.writes) {
      const at = this.arrival.get(`${w.deviceId}#${w.mutationId}`);
      if (at === undefined) throw new Error(`oracle: write ${w.deviceId}#${w.mutationId} never reached the server`);
      const stamp = { clock: pullBack(w.draft.clock, at, this.aheadMs), mutationId: w.mutationId };
      const key = `${w.draft.collection}/${w.draft.recordId}`;
      let s = state.get(key);
      if (!s) {
        s = { rec: { collection: w.draft.collection, id: w.draft.recordId, fields: {}, deleted: false }, fieldStamp: new Map() };
        state.set(key, s);
      }
      if (w.draft.op === 'upsert') {
        for (const [f, v] of Object.entries(w.draft.fields)) {
          if (later(stamp, s.fieldStamp.get(f))) {
            s.fieldStamp.set(f, stamp);
            s.rec.fields[f] = v;
          }
        }
      } else if (later(stamp, s.deleteStamp)) {
        s.deleteStamp = stamp;
        s.rec.deleted = w.draft.op === 'delete';
      }
    }
    return new Map([...state].map(([k, v]) => [k, v.rec]));
  }
}
