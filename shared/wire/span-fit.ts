import { DEFAULT_ALLOWANCES } from './cut-length';

/*
 * Does a span between two supports take the wire? Needed: wire + an insulator at each end + at least the
 * minimum rope at each end (common practice: ~1 m keeps the high-voltage wire end away from the tree).
 * The sag of a tensioned span adds well under 1 % to its length and is ignored here.
 */
export type SpanFit = { fits: boolean; requiredM: number; ropePerEndM: number; shortByM: number };

export function spanFit(o: { distanceM: number; wireLengthM: number; insulatorM?: number; minRopePerEndM?: number }): SpanFit {
  const ins = o.insulatorM ?? DEFAULT_ALLOWANCES.insulatorM;
  const rope = o.minRopePerEndM ?? DEFAULT_ALLOWANCES.minRopePerEndM;
  if (!(o.distanceM > 0)) throw new Error(`distance between supports must be above 0 m (got ${o.distanceM})`);
  if (!(o.wireLengthM > 0)) throw new Error(`wire length must be above 0 m (got ${o.wireLengthM})`);
  if (!(ins >= 0) || !(rope >= 0)) throw new Error('insulator and rope allowances must be ≥ 0');
  const requiredM = o.wireLengthM + 2 * ins + 2 * rope;
  const ropePerEndM = (o.distanceM - o.wireLengthM - 2 * ins) / 2;
  return { fits: o.distanceM >= requiredM, requiredM, ropePerEndM, shortByM: Math.max(0, requiredM - o.distanceM) };
}
