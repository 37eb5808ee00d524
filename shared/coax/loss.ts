import { COAX_LOSS_DB_PER_100FT_AT_30MHZ, type CoaxType } from './cable-table';

const M_PER_100FT = 30.48;

/**
 * Matched loss of lengthM of cable at freqMhz: the 30 MHz table value scaled by √(f/30), because below
 * about 100 MHz conductor (skin-effect) loss dominates and grows as √f (textbook). Null when no table row.
 */
export function matchedLossDb(type: CoaxType, freqMhz: number, lengthM: number): number | null {
  const at30 = COAX_LOSS_DB_PER_100FT_AT_30MHZ[type];
  if (at30 === null) return null;
  if (!(freqMhz > 0) || !(lengthM >= 0)) throw new RangeError('frequency must be above 0 and length at least 0');
  return at30 * Math.sqrt(freqMhz / 30) * (lengthM / M_PER_100FT);
}

/**
 * Extra loss on a lossy line from the SWR at the antenna end (ARRL Antenna Book, "additional loss due to
 * SWR", formula from memory): total = 10·log10[(a² − ρ²)/(a·(1 − ρ²))], a = 10^(matched/10),
 * ρ = (SWR − 1)/(SWR + 1). It is zero on a matched line and on a lossless line.
 */
export function swrExtraLossDb(matchedDb: number, swr: number): number {
  if (!(swr >= 1)) throw new RangeError('SWR is at least 1');
  if (!Number.isFinite(swr)) return Infinity;
  const rho = (swr - 1) / (swr + 1);
  const a = 10 ** (matchedDb / 10);
  const totalDb = 10 * Math.log10((a * a - rho * rho) / (a * (1 - rho * rho)));
  return Math.max(0, totalDb - matchedDb);
}
