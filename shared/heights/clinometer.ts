/*
 * Tree and mast heights from a clinometer or a laser rangefinder. Angles in degrees above the horizontal
 * (negative below eye level), horizontal distances in metres.
 *  - tangent method on level ground: h = d·tan(α_top) + eye height;
 *  - two-angle method (any slope): h = d·(tan α_top − tan α_base), α_base negative when the base is below
 *    the eye (Sewanee forestry notes [doc]);
 *  - percent scale: rise = d/100 × %, h = d/100·(%top − %base) (DeYoung, Forest Measurements §2.3 [doc]);
 *  - laser sine method: height above the eye = slant distance × sin α (Native Tree Society [doc]).
 */

function num(v: number, what: string): number {
  if (!Number.isFinite(v)) throw new Error(`${what} must be a number`);
  return v;
}

function angle(v: number, what: string): number {
  num(v, what);
  if (v <= -90 || v >= 90) throw new Error(`${what} must be between −90° and 90° (got ${v})`);
  return (v * Math.PI) / 180;
}

function positive(v: number, what: string): number {
  num(v, what);
  if (v <= 0) throw new Error(`${what} must be above 0 (got ${v})`);
  return v;
}

function result(h: number): number {
  if (!(h > 0)) throw new Error(`the readings give a height of ${h.toFixed(2)} m: check that the top reading is above the base reading`);
  return h;
}

export function tangentHeightM(o: { distanceM: number; topDeg: number; eyeHeightM: number }): number {
  positive(o.distanceM, 'distance');
  num(o.eyeHeightM, 'eye height');
  if (o.eyeHeightM < 0 || o.eyeHeightM > 3) throw new Error(`eye height must be 0–3 m (got ${o.eyeHeightM})`);
  return result(o.distanceM * Math.tan(angle(o.topDeg, 'top angle')) + o.eyeHeightM);
}

export function twoAngleHeightM(o: { distanceM: number; topDeg: number; baseDeg: number }): number {
  positive(o.distanceM, 'distance');
  return result(o.distanceM * (Math.tan(angle(o.topDeg, 'top angle')) - Math.tan(angle(o.baseDeg, 'base angle'))));
}

export function percentHeightM(o: { distanceM: number; topPercent: number; basePercent: number }): number {
  positive(o.distanceM, 'distance');
  num(o.topPercent, 'top reading');
  num(o.basePercent, 'base reading');
  return result((o.distanceM / 100) * (o.topPercent - o.basePercent));
}

/**
 * Laser sine method: slant distance to the top and its angle; the base either by its own slant distance and
 * (negative) angle, or, on level ground, the eye height.
 */
export function laserSineHeightM(o: { slantTopM: number; topDeg: number; slantBaseM?: number; baseDeg?: number; eyeHeightM?: number }): number {
  positive(o.slantTopM, 'slant distance to the top');
  const top = o.slantTopM * Math.sin(angle(o.topDeg, 'top angle'));
  let below: number;
  if (o.slantBaseM !== undefined || o.baseDeg !== undefined) {
    if (o.slantBaseM === undefined || o.baseDeg === undefined) throw new Error('the base needs both its slant distance and its angle');
    below = -positive(o.slantBaseM, 'slant distance to the base') * Math.sin(angle(o.baseDeg, 'base angle'));
  } else {
    if (o.eyeHeightM === undefined) throw new Error('give the base reading or the eye height');
    below = num(o.eyeHeightM, 'eye height');
  }
  return result(top + below);
}
