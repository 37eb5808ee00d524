import { BANDS, type BandName } from '../bands';
import { SAFETY_CAUTION } from '../clearance/cautions';
import { type PlanePoint, planeBearingDeg, planeDistanceM } from '../clearance/planar';
import type { Clearance } from '../clearance/types';
import { SPEED_OF_LIGHT_M_PER_US, wavelengthM as wavelengthAtM } from '../ground';

export type Orientation = 'end-to-end' | 'side-by-side' | 'parallel-offset' | 'crossed' | 'oblique';

export type SeparationResult = Clearance & {
  kind: 'station-separation';
  wavelengths: number;
  orientation: Orientation;
  /** "same band", "40m × 2 falls in 20m", or null. */
  harmonic: string | null;
  /** Rough free-space coupling estimate between the two antennas, dB (see ISOLATION_CAVEAT). */
  isolationDb: number;
};

export const ISOLATION_CAVEAT =
  'Isolation is a rough free-space far-field (Friis) estimate between two dipoles: near-field coupling under about 1 λ, ' +
  'the ground, feed-line pickup and filters can change it by 10 dB or more.';
export const SEPARATION_SOURCE = 'common practice for multi-station field days; isolation from the Friis transmission equation';

/** Which multiple (2…6) of the lower band lands in the higher band, if any (harmonic interference). */
export function harmonicRelation(lower: BandName, higher: BandName): number | null {
  const lo = BANDS[lower];
  const hi = BANDS[higher];
  for (let n = 2; n <= 6; n++) if (n * lo.lowMhz <= hi.highMhz && n * lo.highMhz >= hi.lowMhz) return n;
  return null;
}

export type SeparatedAntenna = {
  needKey: string;
  band: BandName;
  freqMhz: number;
  feed: PlanePoint;
  wireAzimuthDeg: number;
  /** Free-space horizontal-plane gain by degrees from the wire axis. */
  azimuthGainsDbi: readonly number[];
};

/** Nulls are not trusted between antennas a few wavelengths apart: gains are floored here (Loftline's choice). */
const COUPLING_GAIN_FLOOR_DBI = -10;

function gainToward(from: SeparatedAntenna, to: PlanePoint): number {
  const rel = Math.round(planeBearingDeg(from.feed, to) - from.wireAzimuthDeg);
  return Math.max(COUPLING_GAIN_FLOOR_DBI, from.azimuthGainsDbi[((rel % 360) + 360) % 360]);
}

function orientationOf(a: SeparatedAntenna, b: SeparatedAntenna): Orientation {
  let delta = Math.abs(a.wireAzimuthDeg - b.wireAzimuthDeg) % 180;
  if (delta > 90) delta = 180 - delta;
  if (delta > 60) return 'crossed';
  if (delta >= 30) return 'oblique';
  let psi = Math.abs(planeBearingDeg(a.feed, b.feed) - a.wireAzimuthDeg) % 180;
  if (psi > 90) psi = 180 - psi;
  if (psi < 30) return 'end-to-end';
  if (psi > 60) return 'side-by-side';
  return 'parallel-offset';
}

function harmonicText(lower: BandName, higher: BandName): string | null {
  if (lower === higher) return 'same band';
  const n = harmonicRelation(lower, higher);
  return n ? `${lower} × ${n} falls in ${higher}` : null;
}

/**
 * The level alone, for the assignment's many pair checks: closer than minWavelengths of the lower band is
 * blocked; closer than reviewWavelengths on the same band or harmonically related needs review; otherwise
 * clear. It depends only on the feed points and the bands (orientation is reported, with the isolation, but
 * does not change the level), which lets the assignment keep one leg direction per inverted-V support.
 */
export function pairLevel(a: SeparatedAntenna, b: SeparatedAntenna, minWavelengths: number, reviewWavelengths: number): Clearance['level'] {
  const lower = a.freqMhz <= b.freqMhz ? a : b;
  const higher = lower === a ? b : a;
  const dE = a.feed.eastM - b.feed.eastM;
  const dN = a.feed.northM - b.feed.northM;
  const wavelengths = (Math.sqrt(dE * dE + dN * dN) * lower.freqMhz) / SPEED_OF_LIGHT_M_PER_US;
  if (wavelengths < minWavelengths) return 'blocked';
  if (wavelengths >= reviewWavelengths) return 'clear';
  return related(lower.band, higher.band) ? 'needs-review' : 'clear';
}

const relatedCache = new Map<string, boolean>();
function related(lower: BandName, higher: BandName): boolean {
  const key = lower + higher;
  let r = relatedCache.get(key);
  if (r === undefined) {
    r = harmonicText(lower, higher) !== null;
    relatedCache.set(key, r);
  }
  return r;
}

/**
 * Separation between two stations' antennas, measured feed point to feed point in wavelengths of the lower
 * band. Closer than minWavelengths: the pair is not used together ("blocked" here means only that).
 * Closer than reviewWavelengths and on the same band or harmonically related: needs review.
 */
export function separationBetween(
  a: SeparatedAntenna,
  b: SeparatedAntenna,
  minWavelengths: number,
  reviewWavelengths: number,
): SeparationResult {
  const level = pairLevel(a, b, minWavelengths, reviewWavelengths);
  const [lower, higher] = a.freqMhz <= b.freqMhz ? [a, b] : [b, a];
  const lambdaM = wavelengthAtM(lower.freqMhz);
  const distanceM = planeDistanceM(a.feed, b.feed);
  const wavelengths = distanceM / lambdaM;
  const orientation = orientationOf(a, b);
  const harmonic = harmonicText(lower.band, higher.band);
  // Friis path loss minus both antennas' gains toward each other, at each station's frequency; the worse is kept.
  const ga = gainToward(a, b.feed);
  const gb = gainToward(b, a.feed);
  const isolationDb = Math.min(
    ...[a.freqMhz, b.freqMhz].map((f) => 20 * Math.log10((4 * Math.PI * Math.max(distanceM, 0.1)) / wavelengthAtM(f)) - ga - gb),
  );
  const requiredM = minWavelengths * lambdaM;
  const what = `${a.needKey} and ${b.needKey}: ${distanceM.toFixed(1)} m apart (${wavelengths.toFixed(2)} λ at ${lower.band}), ${orientation}`;
  const message =
    level === 'blocked'
      ? `${what}: closer than ${minWavelengths} λ (${requiredM.toFixed(1)} m), not used together.`
      : `${what}${harmonic ? `, ${harmonic}` : ''}; isolation about ${isolationDb.toFixed(0)} dB. ${ISOLATION_CAVEAT}`;
  return {
    key: `station-separation:${a.needKey}|${b.needKey}`,
    kind: 'station-separation',
    level,
    distanceM,
    requiredM,
    rule: `feed points at least ${minWavelengths} λ of the lower band apart; review under ${reviewWavelengths} λ on the same band or harmonically related`,
    source: SEPARATION_SOURCE,
    message,
    caution: SAFETY_CAUTION,
    wavelengths,
    orientation,
    harmonic,
    isolationDb,
  };
}
