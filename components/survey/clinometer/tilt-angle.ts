/*
 * The phone as a clinometer. The scout sights along the phone's top edge (its long y axis) at the treetop.
 * The W3C DeviceOrientation spec orients the device by intrinsic Z-X'-Y'' rotations (alpha, beta, gamma);
 * rotating the y axis [0,1,0] by Ry(gamma) leaves it unchanged and Rx(beta) lifts it to [0, cos β, sin β],
 * so the elevation of the top edge above the horizon is asin(sin β) whatever the sideways roll gamma is.
 * (W3C "DeviceOrientation Event Specification", device coordinate frame and rotation order.)
 */

export function elevationFromBetaDeg(betaDeg: number): number {
  const rad = (betaDeg * Math.PI) / 180;
  return (Math.asin(Math.max(-1, Math.min(1, Math.sin(rad)))) * 180) / Math.PI;
}

export type TiltReading = { elevationDeg: number; atMs: number };

/**
 * A steady reading: the mean of the readings in the last `windowMs`, and whether they agree within
 * `steadyDeg` (a shaking hand gives a wrong angle; the form waits for a steady one before offering it).
 */
export function steadyAngle(readings: readonly TiltReading[], nowMs: number, windowMs = 800, steadyDeg = 0.6): { meanDeg: number; spreadDeg: number; steady: boolean; count: number } | null {
  const recent = readings.filter((r) => nowMs - r.atMs <= windowMs && r.atMs <= nowMs);
  if (recent.length === 0) return null;
  const mean = recent.reduce((s, r) => s + r.elevationDeg, 0) / recent.length;
  const spread = Math.max(...recent.map((r) => r.elevationDeg)) - Math.min(...recent.map((r) => r.elevationDeg));
  return { meanDeg: mean, spreadDeg: spread, steady: recent.length >= 5 && spread <= steadyDeg, count: recent.length };
}
