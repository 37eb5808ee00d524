import { type PlanePoint, planeDistanceM } from '../clearance/planar';
import { type CoaxType } from './cable-table';
import { matchedLossDb, swrExtraLossDb } from './loss';

export type CoaxRunOptions = {
  /** Extra length for a drip loop, routing round obstacles and strain relief, as a fraction of the run. */
  slackFraction: number;
  /** At least this much slack. */
  minSlackM: number;
};
export const DEFAULT_COAX_RUN_OPTIONS: CoaxRunOptions = { slackFraction: 0.1, minSlackM: 2 };

export type CoaxPiece = { id: string; type: CoaxType; lengthM: number };

export type CoaxLoss = { type: CoaxType; matchedDb: number | null; swrExtraDb: number | null; totalDb: number | null };

export type CoaxRun = {
  operatingPositionId: string;
  /** Straight line on the ground from under the feed point to the operating position. */
  groundRouteM: number;
  /** From the feed point down to the ground. */
  dropM: number;
  slackM: number;
  runM: number;
  /** Loss of exactly runM of each cable type the club has (or, with no inventory, of each known type). */
  lossByType: CoaxLoss[];
  /** Single pieces at least runM long, best (lowest loss over its whole length) first. */
  reachingPieceIds: string[];
  /** The best way to make the run from the inventory: one piece, or two joined with a barrel. */
  best: { pieceIds: string[]; type: string; lengthM: number; totalDb: number | null } | null;
};

function lossOf(type: CoaxType, freqMhz: number, lengthM: number, swr: number): CoaxLoss {
  const matchedDb = matchedLossDb(type, freqMhz, lengthM);
  const swrExtraDb = matchedDb === null ? null : swrExtraLossDb(matchedDb, swr);
  return { type, matchedDb, swrExtraDb, totalDb: matchedDb === null || swrExtraDb === null ? null : matchedDb + swrExtraDb };
}

/** Unknown loss sorts after every known loss. */
function lossKey(db: number | null): number {
  return db === null ? Infinity : db;
}

/** The nearest operating position to the feed point, and the run to it. Null when none is recorded. */
export function planCoaxRun(args: {
  feedAt: PlanePoint;
  feedHeightM: number;
  freqMhz: number;
  swr: number;
  operatingPositions: readonly { id: string; at: PlanePoint }[];
  inventory: readonly CoaxPiece[];
  options?: CoaxRunOptions;
}): CoaxRun | null {
  const opts = args.options ?? DEFAULT_COAX_RUN_OPTIONS;
  let nearest: { id: string; d: number } | null = null;
  for (const p of args.operatingPositions) {
    const d = planeDistanceM(args.feedAt, p.at);
    if (!nearest || d < nearest.d) nearest = { id: p.id, d };
  }
  if (!nearest) return null;
  const base = nearest.d + args.feedHeightM;
  const slackM = Math.max(opts.minSlackM, base * opts.slackFraction);
  const runM = base + slackM;
  const types = [...new Set(args.inventory.map((c) => c.type))];
  const lossTypes: CoaxType[] = types.length > 0 ? types : ['RG-213', 'RG-8X', 'RG-58'];
  const lossByType = lossTypes.map((t) => lossOf(t, args.freqMhz, runM, args.swr)).sort((a, b) => lossKey(a.totalDb) - lossKey(b.totalDb));
  const pieceLoss = (p: CoaxPiece) => lossOf(p.type, args.freqMhz, p.lengthM, args.swr).totalDb;
  const reaching = args.inventory
    .filter((p) => p.lengthM >= runM)
    .map((p) => ({ p, db: pieceLoss(p) }))
    .sort((a, b) => lossKey(a.db) - lossKey(b.db) || a.p.lengthM - b.p.lengthM);
  let best: CoaxRun['best'] = null;
  if (reaching.length > 0) {
    const r = reaching[0];
    best = { pieceIds: [r.p.id], type: r.p.type, lengthM: r.p.lengthM, totalDb: r.db };
  } else {
    // Two pieces joined with a barrel connector (connector loss is negligible at HF).
    for (let i = 0; i < args.inventory.length; i++) {
      for (let j = i + 1; j < args.inventory.length; j++) {
        const a = args.inventory[i];
        const b = args.inventory[j];
        if (a.lengthM + b.lengthM < runM) continue;
        const la = lossOf(a.type, args.freqMhz, a.lengthM, 1).matchedDb;
        const lb = lossOf(b.type, args.freqMhz, b.lengthM, 1).matchedDb;
        const matched = la === null || lb === null ? null : la + lb;
        const totalDb = matched === null ? null : matched + swrExtraLossDb(matched, args.swr);
        if (!best || lossKey(totalDb) < lossKey(best.totalDb)) {
          best = { pieceIds: [a.id, b.id], type: a.type === b.type ? a.type : `${a.type}+${b.type}`, lengthM: a.lengthM + b.lengthM, totalDb };
        }
      }
    }
  }
  return {
    operatingPositionId: nearest.id,
    groundRouteM: nearest.d,
    dropM: args.feedHeightM,
    slackM,
    runM,
    lossByType,
    reachingPieceIds: reaching.map((r) => r.p.id),
    best,
  };
}
