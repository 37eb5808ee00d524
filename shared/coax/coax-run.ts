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

type Way = { pieces: CoaxPiece[]; lengthM: number; matchedDb: number | null };

/**
 * The club's inventory at one frequency, ordered once so that many runs can be matched quickly: total loss
 * grows with matched loss at any SWR, so the lowest-matched-loss piece that reaches is the best one.
 */
export type CoaxChooser = {
  /** Best single piece, else best two joined; null when nothing reaches. */
  bestFor(runM: number): Way | null;
  /** Cable types the club has (or common ones with no inventory), lowest loss per metre first. */
  types: CoaxType[];
};

export function makeCoaxChooser(inventory: readonly CoaxPiece[], freqMhz: number): CoaxChooser {
  const order = (a: Way, b: Way) => lossKey(a.matchedDb) - lossKey(b.matchedDb) || a.lengthM - b.lengthM;
  const singles: Way[] = inventory.map((p) => ({ pieces: [p], lengthM: p.lengthM, matchedDb: matchedLossDb(p.type, freqMhz, p.lengthM) })).sort(order);
  const pairs: Way[] = [];
  for (let i = 0; i < inventory.length; i++) {
    for (let j = i + 1; j < inventory.length; j++) {
      const a = singles.find((w) => w.pieces[0] === inventory[i])!;
      const b = singles.find((w) => w.pieces[0] === inventory[j])!;
      const m = a.matchedDb === null || b.matchedDb === null ? null : a.matchedDb + b.matchedDb;
      pairs.push({ pieces: [inventory[i], inventory[j]], lengthM: inventory[i].lengthM + inventory[j].lengthM, matchedDb: m });
    }
  }
  pairs.sort(order);
  const present = [...new Set(inventory.map((c) => c.type))];
  const types = (present.length > 0 ? present : (['RG-213', 'RG-8X', 'RG-58'] as CoaxType[])).sort(
    (a, b) => lossKey(matchedLossDb(a, freqMhz, 1)) - lossKey(matchedLossDb(b, freqMhz, 1)),
  );
  return {
    bestFor: (runM) => singles.find((w) => w.lengthM >= runM) ?? pairs.find((w) => w.lengthM >= runM) ?? null,
    types,
  };
}

/** The operating position nearest the feed point and the run to it (ground route + drop + slack). */
export function nearestRun(
  feedAt: PlanePoint,
  feedHeightM: number,
  operatingPositions: readonly { id: string; at: PlanePoint }[],
  opts: CoaxRunOptions,
): { id: string; groundRouteM: number; slackM: number; runM: number } | null {
  let nearest: { id: string; d: number } | null = null;
  for (const p of operatingPositions) {
    const d = planeDistanceM(feedAt, p.at);
    if (!nearest || d < nearest.d) nearest = { id: p.id, d };
  }
  if (!nearest) return null;
  const base = nearest.d + feedHeightM;
  const slackM = Math.max(opts.minSlackM, base * opts.slackFraction);
  return { id: nearest.id, groundRouteM: nearest.d, slackM, runM: base + slackM };
}

/** Total loss of a way at an SWR (null when a piece has no table row). */
export function wayLossDb(way: Way, swr: number): number | null {
  return way.matchedDb === null ? null : way.matchedDb + swrExtraLossDb(way.matchedDb, swr);
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
  chooser?: CoaxChooser;
}): CoaxRun | null {
  const opts = args.options ?? DEFAULT_COAX_RUN_OPTIONS;
  const run = nearestRun(args.feedAt, args.feedHeightM, args.operatingPositions, opts);
  if (!run) return null;
  const chooser = args.chooser ?? makeCoaxChooser(args.inventory, args.freqMhz);
  const lossByType = chooser.types.map((t) => lossOf(t, args.freqMhz, run.runM, args.swr));
  const reaching = args.inventory
    .filter((p) => p.lengthM >= run.runM)
    .map((p) => ({ p, db: lossOf(p.type, args.freqMhz, p.lengthM, args.swr).totalDb }))
    .sort((a, b) => lossKey(a.db) - lossKey(b.db) || a.p.lengthM - b.p.lengthM);
  const way = chooser.bestFor(run.runM);
  const best: CoaxRun['best'] = way
    ? {
        pieceIds: way.pieces.map((p) => p.id),
        type: [...new Set(way.pieces.map((p) => p.type))].join('+'),
        lengthM: way.lengthM,
        totalDb: wayLossDb(way, args.swr),
      }
    : null;
  return {
    operatingPositionId: run.id,
    groundRouteM: run.groundRouteM,
    dropM: args.feedHeightM,
    slackM: run.slackM,
    runM: run.runM,
    lossByType,
    reachingPieceIds: reaching.map((r) => r.p.id),
    best,
  };
}
