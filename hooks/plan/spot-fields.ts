import type { Candidate } from '@/shared/plan';
import type { AntennaSpot } from '@/shared/schemas';

/* What an assignment writes on an antenna-spot record (no React, so it is unit-tested on its own). */

/** The leg bearing to store for a candidate: its wire's bearing for an inverted-V, null for a flat-top. */
export const legBearingOf = (c: Pick<Candidate, 'shape' | 'wireAzimuthDeg'>) => (c.shape === 'inverted-v' ? c.wireAzimuthDeg : null);

/** The antenna-spot fields for putting a station's band on a candidate (back to "planned": it must be reviewed). */
export function spotFieldsFor(c: Candidate, eventId: string, reason: string) {
  return {
    eventId,
    stationId: c.stationId,
    band: c.band,
    shape: c.shape,
    supportIds: [...c.supportIds],
    // The direction this candidate's legs run, so the review and the crew sheet judge the same wire.
    legAzimuthDeg: legBearingOf(c),
    coaxId: c.coax?.best?.pieceIds[0] ?? null,
    operatingPositionId: c.coax?.operatingPositionId ?? null,
    state: 'planned' as const,
    stateReason: reason,
    inputsFingerprint: '',
    measuredSwr: null,
  };
}

/** Same shape, supports and leg direction: another direction of the same support is a move (back to planned). */
export const sameSpot = (s: AntennaSpot, c: Candidate) =>
  s.shape === c.shape && s.supportIds.join('~') === c.supportIds.join('~') && (s.legAzimuthDeg ?? null) === legBearingOf(c);
