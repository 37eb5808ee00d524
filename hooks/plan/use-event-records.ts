import { useMemo } from 'react';
import { useRecord, useRecords } from '@/hooks/sync';
import type { AntennaSpot, ClubEvent, Photo, ReviewDecision } from '@/shared/schemas';
import type { SiteRecords } from '@/shared/review';

/*
 * Everything the plan, the review and the sheets read for one event, from the local store (works offline).
 * undefined while the store opens; null when the event or its site is not on this device.
 */

export type EventRecords = SiteRecords & {
  event: ClubEvent;
  spots: AntennaSpot[];
  decisions: ReviewDecision[];
  photos: Photo[];
};

export function useEventRecords(eventId: string): EventRecords | null | undefined {
  const event = useRecord('events', eventId);
  const siteId = event?.siteId ?? null;
  const site = useRecord('sites', siteId);
  const filterSite = siteId ? { siteId } : { siteId: '-' };
  const supports = useRecords('supports', filterSite);
  const hazards = useRecords('hazards', filterSite);
  const operatingPositions = useRecords('operatingPositions', filterSite);
  const photos = useRecords('photos', filterSite);
  const stations = useRecords('stations', { eventId });
  const coax = useRecords('coax');
  const spots = useRecords('antennaSpots', { eventId });
  const decisions = useRecords('reviewDecisions');
  return useMemo(() => {
    if (event === null || (siteId && site === null)) return null;
    if (!event || !site || !supports || !hazards || !operatingPositions || !photos || !stations || !coax || !spots || !decisions) return undefined;
    const spotIds = new Set(spots.map((s) => s.id));
    return { event, site, supports, hazards, operatingPositions, photos, stations, coax, spots, decisions: decisions.filter((d) => spotIds.has(d.spotId)) };
  }, [event, siteId, site, supports, hazards, operatingPositions, photos, stations, coax, spots, decisions]);
}
