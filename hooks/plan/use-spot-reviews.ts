import { useMemo } from 'react';
import { evaluateEventSpots } from '@/shared/review';
import type { EventRecords } from './use-event-records';

/** Each spot of the event with its clearance results, fingerprint and derived review state (pure, memoised). */
export function useSpotReviews(records: EventRecords | null | undefined) {
  return useMemo(() => {
    if (!records) return null;
    try {
      return { ...evaluateEventSpots(records, records.spots, records.decisions), error: null as string | null };
    } catch (err) {
      return { spots: [], notes: [], file: null, error: err instanceof Error ? err.message : String(err) };
    }
  }, [records]);
}
