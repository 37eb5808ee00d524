/*
 * Named ground classes: the electrical constants (conductivity σ in S/m, relative permittivity εr) that
 * the pattern and feed-point model use for the earth under an antenna.
 *
 * Two tables are kept side by side, each entry naming where its numbers come from:
 *  - the amateur table "Conductivities and dielectric constants for common types of earth" (ARRL Antenna Book),
 *    read in a faithful reprint [doc];
 *  - the ITU-R Recommendation P.527 categories, whose values were read off its figure from memory and are
 *    flat across HF [memory: not re-read; confirm before relying on the exact numbers].
 */

export type GroundClassInfo =
  | { kind: 'free-space' | 'perfect'; label: string; source: string }
  | { kind: 'real'; label: string; sigmaSPerM: number; epsR: number; source: string };

const AMATEUR = 'ARRL Antenna Book ground table (reprint) [doc]';
const ITU = 'ITU-R P.527 categories, read off its figure [memory: confirm before relying on exact values]';

export const GROUND_CLASSES = {
  'free-space': { kind: 'free-space', label: 'Free space (no ground)', source: 'idealisation' },
  perfect: { kind: 'perfect', label: 'Perfect ground (lossless conductor)', source: 'idealisation (image theory)' },
  'very-good': { kind: 'real', label: 'Very good: pastoral, rich soil', sigmaSPerM: 0.0303, epsR: 20, source: AMATEUR },
  average: { kind: 'real', label: 'Average: medium hills, forest, heavy clay', sigmaSPerM: 0.005, epsR: 13, source: AMATEUR },
  poor: { kind: 'real', label: 'Poor: rocky, steep hills', sigmaSPerM: 0.002, epsR: 13, source: `${AMATEUR}; the table gives εr 12–14, 13 taken` },
  'sandy-dry': { kind: 'real', label: 'Sandy, dry, coastal', sigmaSPerM: 0.002, epsR: 10, source: AMATEUR },
  'very-poor': { kind: 'real', label: 'Very poor: cities, industrial', sigmaSPerM: 0.001, epsR: 5, source: AMATEUR },
  'fresh-water': { kind: 'real', label: 'Fresh water (lake, river)', sigmaSPerM: 0.001, epsR: 80, source: AMATEUR },
  'salt-water': { kind: 'real', label: 'Salt water', sigmaSPerM: 5, epsR: 81, source: AMATEUR },
  'sea-water': { kind: 'real', label: 'Sea water (ITU-R)', sigmaSPerM: 5, epsR: 70, source: ITU },
  'itu-fresh-water': { kind: 'real', label: 'Fresh water (ITU-R)', sigmaSPerM: 0.003, epsR: 80, source: ITU },
  'wet-ground': { kind: 'real', label: 'Wet ground (ITU-R)', sigmaSPerM: 0.01, epsR: 30, source: ITU },
  'medium-dry-ground': { kind: 'real', label: 'Medium dry ground (ITU-R)', sigmaSPerM: 0.001, epsR: 15, source: ITU },
  'very-dry-ground': { kind: 'real', label: 'Very dry ground (ITU-R)', sigmaSPerM: 0.0001, epsR: 3, source: ITU },
} as const satisfies Record<string, GroundClassInfo>;

export type GroundClassName = keyof typeof GROUND_CLASSES;

export const GROUND_CLASS_NAMES = Object.keys(GROUND_CLASSES) as GroundClassName[];

export function isGroundClassName(name: string): name is GroundClassName {
  return Object.prototype.hasOwnProperty.call(GROUND_CLASSES, name);
}
