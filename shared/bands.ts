/*
 * US amateur HF/6 m band edges from 47 CFR 97.301 [doc]; the band names are the ones the records use
 * (shared/schemas/records.ts BAND_NAMES). 60 m is five channels (47 CFR 97.303(h)), not a band edge pair:
 * the range here runs from the lowest channel centre to the highest (5.3305–5.4035 MHz) so a dipole for
 * 60 m can be cut for its centre [doc: 47 CFR 97.303(h) channel list, from memory].
 */
import { BAND_NAMES } from './schemas/records';

export type BandName = (typeof BAND_NAMES)[number];
export { BAND_NAMES };

const CFR = '47 CFR 97.301 [doc]';

export const BANDS: Record<BandName, { lowMhz: number; highMhz: number; source: string }> = {
  '160m': { lowMhz: 1.8, highMhz: 2.0, source: CFR },
  '80m': { lowMhz: 3.5, highMhz: 4.0, source: CFR },
  '60m': { lowMhz: 5.3305, highMhz: 5.4035, source: '47 CFR 97.303(h) channel centres [memory]' },
  '40m': { lowMhz: 7.0, highMhz: 7.3, source: CFR },
  '30m': { lowMhz: 10.1, highMhz: 10.15, source: CFR },
  '20m': { lowMhz: 14.0, highMhz: 14.35, source: CFR },
  '17m': { lowMhz: 18.068, highMhz: 18.168, source: CFR },
  '15m': { lowMhz: 21.0, highMhz: 21.45, source: CFR },
  '12m': { lowMhz: 24.89, highMhz: 24.99, source: CFR },
  '10m': { lowMhz: 28.0, highMhz: 29.7, source: CFR },
  '6m': { lowMhz: 50.0, highMhz: 54.0, source: CFR },
};

export function isBandName(name: string): name is BandName {
  return (BAND_NAMES as readonly string[]).includes(name);
}

/** Arithmetic centre of the band in MHz (what a dipole is cut for when no frequency is given). */
export function bandCentreMhz(band: BandName): number {
  const b = BANDS[band];
  if (!b) throw new Error(`unknown band "${String(band)}" (known: ${BAND_NAMES.join(', ')})`);
  return (b.lowMhz + b.highMhz) / 2;
}

/** The band a frequency falls in, or null outside every US amateur band listed. */
export function bandForFrequency(freqMhz: number): BandName | null {
  for (const name of BAND_NAMES) {
    const b = BANDS[name];
    if (freqMhz >= b.lowMhz && freqMhz <= b.highMhz) return name;
  }
  return null;
}
