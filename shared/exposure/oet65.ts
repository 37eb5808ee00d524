import { type ExposureTier, mpeLimitMwPerCm2 } from './mpe-limits';

/*
 * Far-field power density with ground reflection, FCC OET Bulletin 65 Supplement B:
 * S = 0.64·EIRP/(π·R²) (EIRP in mW, R in cm, S in mW/cm²); without the reflection the factor is 0.25.
 * The 0.64 factor assumes the reflected wave adds in phase (field ×1.6), the Bulletin's worst case.
 * At HF these distances are often in the antenna's near field, where the Bulletin notes the far-field
 * formula is a conservative planning figure, not a measurement.
 */
export const OET65_SOURCE = 'FCC OET Bulletin 65 Supplement B, far-field estimate with ground reflection';
export const GROUND_REFLECTION_FACTOR = 0.64;
export const NO_REFLECTION_FACTOR = 0.25;

export function eirpW(averagePowerW: number, gainDbi: number): number {
  return averagePowerW * 10 ** (gainDbi / 10);
}

/** Distance in metres at which the estimate falls to the density limit sMwPerCm2. */
export function distanceForDensityM(eirpWatts: number, sMwPerCm2: number, factor = GROUND_REFLECTION_FACTOR): number {
  const rCm = Math.sqrt((factor * eirpWatts * 1000) / (Math.PI * sMwPerCm2));
  return rCm / 100;
}

/** Power density in mW/cm² at distanceM. */
export function densityAtMwPerCm2(eirpWatts: number, distanceM: number, factor = GROUND_REFLECTION_FACTOR): number {
  const rCm = distanceM * 100;
  return (factor * eirpWatts * 1000) / (Math.PI * rCm * rCm);
}

export type ExposureInput = {
  freqMhz: number;
  /** Peak envelope power at the antenna (feed-line loss may be subtracted by the caller, or not, to stay conservative). */
  powerW: number;
  /** Mode duty factor (0–1]. */
  dutyFactor: number;
  /** Fraction of the averaging time spent transmitting (0–1]; 1 is the worst case. */
  transmitFraction: number;
  /** Antenna gain toward the person, dBi. */
  gainDbi: number;
};

export type ExposureDistances = {
  averagePowerW: number;
  eirpW: number;
  limitMwPerCm2: Record<ExposureTier, number>;
  /** Minimum distance for the club's operators (controlled) and for the public (uncontrolled). */
  distanceM: Record<ExposureTier, number>;
};

export function exposureDistances(input: ExposureInput): ExposureDistances {
  if (!(input.dutyFactor > 0 && input.dutyFactor <= 1)) throw new RangeError('duty factor must be in (0, 1]');
  if (!(input.transmitFraction > 0 && input.transmitFraction <= 1)) throw new RangeError('transmit fraction must be in (0, 1]');
  const averagePowerW = input.powerW * input.dutyFactor * input.transmitFraction;
  const e = eirpW(averagePowerW, input.gainDbi);
  const limits = {
    controlled: mpeLimitMwPerCm2(input.freqMhz, 'controlled'),
    uncontrolled: mpeLimitMwPerCm2(input.freqMhz, 'uncontrolled'),
  };
  return {
    averagePowerW,
    eirpW: e,
    limitMwPerCm2: limits,
    distanceM: {
      controlled: distanceForDensityM(e, limits.controlled),
      uncontrolled: distanceForDensityM(e, limits.uncontrolled),
    },
  };
}
