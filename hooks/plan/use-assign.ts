import { useCallback } from 'react';
import { useMutate } from '@/hooks/sync';
import type { Candidate, PlanResult } from '@/shared/plan';
import type { AntennaSpot } from '@/shared/schemas';
import { sameSpot, spotFieldsFor } from './spot-fields';

export { spotFieldsFor } from './spot-fields';

/** Assign by hand, move an assignment, or take the engine's assignment for every station. */
export function useAssign(eventId: string, spots: readonly AntennaSpot[]) {
  const mutate = useMutate();
  const assignOne = useCallback(
    async (c: Candidate, reason = 'Assigned by the lead') => {
      const existing = spots.find((s) => s.deletedAt === null && s.stationId === c.stationId && s.band === c.band);
      if (existing && sameSpot(existing, c)) return existing.id;
      if (existing) {
        await mutate.update('antennaSpots', existing.id, { ...spotFieldsFor(c, eventId, `Moved by the lead`) });
        return existing.id;
      }
      return mutate.create('antennaSpots', { ...spotFieldsFor(c, eventId, reason), notes: '' });
    },
    [eventId, spots, mutate],
  );
  const assignAll = useCallback(
    async (plan: PlanResult) => {
      let n = 0;
      for (const s of plan.assignment.spots) {
        if (!s.candidate) continue;
        await assignOne(s.candidate, 'Assigned by "assign all stations"');
        n++;
      }
      return n;
    },
    [assignOne],
  );
  const sendForReview = useCallback(
    (spot: AntennaSpot, fingerprint: string) => mutate.update('antennaSpots', spot.id, { state: 'waiting-review', inputsFingerprint: fingerprint, stateReason: 'Sent for review by the lead' }),
    [mutate],
  );
  const remove = useCallback((spot: AntennaSpot) => mutate.remove('antennaSpots', spot.id), [mutate]);
  return { assignOne, assignAll, sendForReview, remove };
}
