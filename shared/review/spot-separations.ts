import { DEFAULT_PLAN_OPTIONS } from '../plan/options';
import { freeSpaceAzimuthGainsDbi } from '../plan/physics';
import { type SeparationResult, separationBetween } from '../plan/separation';
import type { SpotEvaluation } from './spot-evaluation';

/**
 * Separation between every two spots the lead actually chose (not only the engine's own assignment), with
 * the same rule and wording as the planner: closer than 0.5 λ blocked, closer than 1 λ on related bands
 * needs review (Loftline's defaults, see shared/plan/options.ts).
 */
export function spotSeparations(spots: readonly SpotEvaluation[]): SeparationResult[] {
  const built = spots
    .filter((s) => s.evaluated)
    .map((s) => {
      const c = s.evaluated!.candidate;
      const { ground: _g, ...rest } = s.evaluated!.patternInput;
      return {
        needKey: c.needKey,
        band: c.band,
        freqMhz: s.evaluated!.patternInput.freqMhz,
        feed: c.feed,
        wireAzimuthDeg: c.wireAzimuthDeg,
        azimuthGainsDbi: freeSpaceAzimuthGainsDbi({ ...rest, heightM: 10, endHeightsM: undefined }),
      };
    });
  const out: SeparationResult[] = [];
  for (let i = 0; i < built.length; i++) {
    for (let j = i + 1; j < built.length; j++) {
      out.push(separationBetween(built[i], built[j], DEFAULT_PLAN_OPTIONS.minSeparationWavelengths, DEFAULT_PLAN_OPTIONS.reviewSeparationWavelengths));
    }
  }
  return out;
}
