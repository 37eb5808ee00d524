import { legEndOffsetM } from '@/shared/plan';
import { antennaSpotFieldsSchema } from '@/shared/schemas';
import type { SpotEvaluation } from '@/shared/review';

/*
 * How an inverted-V's leg direction is said and typed: the two compass bearings (degrees true) along which
 * the legs come down from the apex, and the typed bearing checked by the record's own field schema.
 */

const deg = (d: number) => {
  const r = Math.round(d * 10) / 10;
  return `${Number.isInteger(r) ? r.toFixed(0) : r.toFixed(1)}°`;
};

/** The two leg bearings, as written: ["30°", "210°"] for a wire along 30° (or 210°). */
export function legBearingsDeg(wireAzimuthDeg: number): [string, string] {
  const a = ((wireAzimuthDeg % 180) + 180) % 180;
  return [deg(a), deg(a + 180)];
}

/** "legs run 30° – 210°" for a wire along 30°. */
export function legsText(wireAzimuthDeg: number): string {
  const [a, b] = legBearingsDeg(wireAzimuthDeg);
  return `legs run ${a} – ${b}`;
}

/** Where each leg end comes down: its horizontal distance out from the foot of the support. */
export function legEndOutM(c: { wireLengthM: number; apexDeg: number | null }): number | null {
  return c.apexDeg === null ? null : legEndOffsetM(c.wireLengthM / 2, c.apexDeg);
}

export type LegChoice = 'best' | 'typed' | `${number}`;

/** The choices of leg direction: the engine's best, each of the engine's directions, or a typed bearing. */
export function legChoices(directionsDeg: readonly number[]): { value: LegChoice; label: string }[] {
  return [
    { value: 'best', label: 'Best for the station' },
    ...directionsDeg.map((d) => ({ value: `${d}` as LegChoice, label: legBearingsDeg(d).join(' – ') })),
    { value: 'typed', label: 'Type a bearing' },
  ];
}

/**
 * The bearing to evaluate for a choice: null for "best", the direction's number, or the typed value checked
 * by antennaSpots.legAzimuthDeg's schema. `error` is set (in plain words) when the typed value will not do.
 */
export function legBearingFor(choice: LegChoice, typed: number | null): { bearingDeg: number | null; error: string | null } {
  if (choice === 'best') return { bearingDeg: null, error: null };
  if (choice !== 'typed') return { bearingDeg: Number(choice), error: null };
  if (typed === null) return { bearingDeg: null, error: 'Type the bearing the legs run along, 0 to 179.9° true (for legs to 30° and 210°, type 30).' };
  if (Number.isNaN(typed)) return { bearingDeg: null, error: 'The leg bearing is a number of degrees, such as 30.' };
  const parsed = antennaSpotFieldsSchema.shape.legAzimuthDeg.safeParse(typed);
  if (!parsed.success) return { bearingDeg: null, error: `The leg bearing must be 0 to 179.9° true: ${parsed.error.issues[0]?.message ?? 'out of range'}.` };
  return { bearingDeg: parsed.data, error: null };
}

/**
 * ", legs run 30° – 210°" for a recorded inverted-V, saying whether the lead chose the direction or the
 * engine picks its best; empty for a flat-top.
 */
export function spotLegsText(s: Pick<SpotEvaluation, 'spot' | 'evaluated'>): string {
  if (s.spot.shape !== 'inverted-v') return '';
  const c = s.evaluated?.candidate;
  if (!c) return s.spot.legAzimuthDeg === null ? '' : `, ${legsText(s.spot.legAzimuthDeg)} (chosen)`;
  return `, ${legsText(c.wireAzimuthDeg)}${s.spot.legAzimuthDeg === null ? ' (the engine’s best direction; none chosen)' : ''}`;
}
