import { LAUNCH_METHODS as REACH_METHODS, laserSineHeightM, percentHeightM, tangentHeightM, twoAngleHeightM, usableAttachmentHeightM, type LaunchMethod } from '../../../shared/heights';
import type { HeightMath } from './height-form-logic';

/** The height form's doorway to shared/heights (the formulas and their sources live there). */
export const heightMath: HeightMath = {
  tangent: (distanceM, topDeg, eyeHeightM) => tangentHeightM({ distanceM, topDeg, eyeHeightM }),
  twoAngle: (distanceM, topDeg, baseDeg) => twoAngleHeightM({ distanceM, topDeg, baseDeg }),
  percent: (distanceM, topPercent, basePercent) => percentHeightM({ distanceM, topPercent, basePercent }),
  sine: (slantM, topDeg, eyeHeightM) => laserSineHeightM({ slantTopM: slantM, topDeg, eyeHeightM }),
};

export const ATTACH_DEFAULT_NOTE = 'a common-practice default from the tree height and the launch method; change it to what you see';

/**
 * Suggested usable attachment height for a tree (shared/heights defaults, marked common practice there), or
 * null when there is no rule for the launch method (climbing, none) or no method chosen yet.
 */
export function defaultAttachHeightM(treeHeightM: number, launch: string | null): number | null {
  if (!launch || !(REACH_METHODS as readonly string[]).includes(launch)) return null;
  if (!(treeHeightM > 0) || treeHeightM > 150) return null;
  return usableAttachmentHeightM({ treeHeightM, method: launch as LaunchMethod }).heightM;
}
