import type { Ground } from '../ground';

/** A centre-fed wire dipole over flat ground. Lengths and heights in metres, angles in degrees. */
export type DipoleInput = {
  freqMhz: number;
  ground: Ground;
  shape: 'flat' | 'inverted-v';
  /** flat: height of the feed point (the wire centre, after sag); inverted-V: apex (feed point) height. */
  heightM: number;
  /** Total wire length between the end insulators; default: the practical half-wave cut for freqMhz (shared/wire). */
  lengthM?: number;
  /** Flat-top only: heights of the two wire ends (default: both = heightM, a level wire). */
  endHeightsM?: [number, number];
  /** Inverted-V only: included angle between the legs (default 120°). */
  apexDeg?: number;
  /** Conductor diameter (default 1.63 mm, 14 AWG). */
  wireDiameterM?: number;
};

export type OperatorWindowId = 'long-distance' | 'regional' | 'near-vertical';

export type PatternSummary = {
  /** Highest gain anywhere in the broadside elevation cut, dBi (relative to the power into the feed point). */
  peakGainDbi: number;
  /** Elevation angle of that peak (takeoff angle), degrees above the horizon. */
  takeoffDeg: number;
  /** Where the main lobe falls 3 dB below its peak, degrees; 0 or 90 when the lobe reaches the horizon or zenith. */
  halfPower: { lowDeg: number; highDeg: number };
  /** Every local maximum of the broadside elevation cut from 0° to 90°, low angle first. */
  lobes: { elevationDeg: number; gainDbi: number }[];
  /** Every local minimum between lobes, low angle first. */
  nulls: { elevationDeg: number }[];
  /** Broadside gain averaged (as power) over the operator windows, in dBi. */
  windows: { id: OperatorWindowId; fromDeg: number; toDeg: number; meanGainDbi: number }[];
  /** Feed-point impedance at freqMhz, ohms. */
  feed: { resistanceOhm: number; reactanceOhm: number };
  /** SWR on a 50 Ω line at the feed point. */
  swr50: number;
  /** 10·log10(power into the feed / power radiated into the sky); 0 over free space and perfect ground. */
  groundLossDb: number;
  /** Feed-point height in wavelengths. */
  heightWavelengths: number;
  /** Plain-words notes where this case stretches the model (empty when it is well inside it). */
  modelNotes: string[];
};

export type ElevationPoint = { deg: number; gainDbi: number };
export type AzimuthPoint = { azimuthDeg: number; gainDbi: number };
export type FeedPoint = { freqMhz: number; resistanceOhm: number; reactanceOhm: number; swr50: number };
export type ResonanceInfo = {
  /** Frequency of the lowest SWR on 50 Ω in the searched range, and that SWR. */
  lowestSwrMhz: number;
  lowestSwr: number;
  /** Frequency where the feed reactance crosses zero going up (series resonance), or null if none in range. */
  zeroReactanceMhz: number | null;
};
