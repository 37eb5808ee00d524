/*
 * Usable attachment height: how high a line can actually be put over a branch. The scout's own estimate
 * wins when given (they looked at the branches); otherwise it comes from the tree height and the launch
 * method. Defaults are COMMON PRACTICE among field-day crews, recalled rather than read from a source
 * [memory]: usable crotches sit at about 80 % of a tree's height, and each launch method has a practical
 * reach.
 */

export const LAUNCH_METHODS = ['hand-throw', 'throw-bag', 'slingshot', 'pneumatic'] as const;
export type LaunchMethod = (typeof LAUNCH_METHODS)[number];

export const LAUNCH_REACH_M: Record<LaunchMethod, { reachM: number; label: string; source: string }> = {
  'hand-throw': { reachM: 8, label: 'Weight thrown by hand', source: 'common practice [memory]' },
  'throw-bag': { reachM: 15, label: 'Arborist throw bag', source: 'common practice [memory]' },
  slingshot: { reachM: 25, label: 'Slingshot launcher', source: 'common practice [memory]' },
  pneumatic: { reachM: 40, label: 'Pneumatic launcher', source: 'common practice [memory]' },
};

/** Fraction of the tree's height where a usable branch crotch is found (common practice [memory]). */
export const USABLE_FRACTION_OF_TREE = 0.8;

export type AttachmentEstimate = { heightM: number; basis: 'scout-estimate' | 'tree-fraction' | 'launch-reach'; note: string };

export function usableAttachmentHeightM(o: { treeHeightM: number; method: LaunchMethod; scoutEstimateM?: number | null }): AttachmentEstimate {
  if (!Number.isFinite(o.treeHeightM) || o.treeHeightM <= 0 || o.treeHeightM > 150) {
    throw new Error(`tree height must be above 0 and at most 150 m (got ${o.treeHeightM})`);
  }
  const reach = LAUNCH_REACH_M[o.method];
  if (!reach) throw new Error(`unknown launch method "${String(o.method)}" (known: ${LAUNCH_METHODS.join(', ')})`);
  if (o.scoutEstimateM !== undefined && o.scoutEstimateM !== null) {
    const s = o.scoutEstimateM;
    if (!Number.isFinite(s) || s <= 0 || s > o.treeHeightM) {
      throw new Error(`the scout's attachment estimate must be above 0 and no higher than the tree (${o.treeHeightM} m)`);
    }
    return { heightM: s, basis: 'scout-estimate', note: "the scout's own estimate" };
  }
  const byTree = USABLE_FRACTION_OF_TREE * o.treeHeightM;
  if (byTree <= reach.reachM) {
    return { heightM: byTree, basis: 'tree-fraction', note: `${Math.round(USABLE_FRACTION_OF_TREE * 100)} % of the tree height (common practice)` };
  }
  return { heightM: reach.reachM, basis: 'launch-reach', note: `practical reach of a ${reach.label.toLowerCase()} (common practice)` };
}
