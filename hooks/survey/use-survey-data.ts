import { useMemo } from 'react';
import { useRecord, useRecords } from '@/hooks/sync';
import type { Hazard, Measurement, OperatingPosition, Photo, Site, Support } from '@/shared/schemas';
import { boundsOf } from '@/components/survey/plan/plan-transform';
import { buildFeatures, featurePoints, type PlanFeature } from '@/components/survey/plan/plan-features';
import { projector } from '@/components/survey/placement/survey-geo';

export type SurveyData = {
  /** The local store is still opening or reading: show a wait, not "nothing here". */
  loading: boolean;
  site: Site | null;
  supports: Support[];
  hazards: Hazard[];
  positions: OperatingPosition[];
  measurements: Measurement[];
  photos: Photo[];
  features: PlanFeature[];
  project: ((lat: number, lon: number) => { eastM: number; northM: number }) | null;
  /** Largest extent of what has been recorded, metres: how the forms judge a fix "worse than the site". */
  siteSpanM: number | null;
};

function onSite<T extends { siteId: string; deletedAt: string | null }>(xs: readonly T[] | undefined, siteId: string): T[] {
  return (xs ?? []).filter((x) => x.siteId === siteId && !x.deletedAt);
}

/** One site's survey, read from the phone's local store (live: updates as records change or sync in). */
export function useSurveyData(siteId: string): SurveyData {
  const site = useRecord('sites', siteId) as Site | null | undefined;
  const allSupports = useRecords('supports') as Support[] | undefined;
  const allHazards = useRecords('hazards') as Hazard[] | undefined;
  const allPositions = useRecords('operatingPositions') as OperatingPosition[] | undefined;
  const allMeasurements = useRecords('measurements') as Measurement[] | undefined;
  const allPhotos = useRecords('photos') as Photo[] | undefined;
  const supports = useMemo(() => onSite(allSupports, siteId), [allSupports, siteId]);
  const hazards = useMemo(() => onSite(allHazards, siteId), [allHazards, siteId]);
  const positions = useMemo(() => onSite(allPositions, siteId), [allPositions, siteId]);
  const measurements = useMemo(() => onSite(allMeasurements, siteId), [allMeasurements, siteId]);
  const photos = useMemo(() => onSite(allPhotos, siteId), [allPhotos, siteId]);
  const live = site && !site.deletedAt ? site : null;
  const project = useMemo(() => (live ? projector({ lat: live.refLat, lon: live.refLon }) : null), [live?.refLat, live?.refLon]);
  const features = useMemo(() => (project ? buildFeatures({ supports, hazards, operatingPositions: positions }, project) : []), [project, supports, hazards, positions]);
  const b = boundsOf(featurePoints(features));
  const siteSpanM = b && features.length >= 2 ? Math.max(b.maxEastM - b.minEastM, b.maxNorthM - b.minNorthM) : null;
  const loading = site === undefined || allSupports === undefined || allHazards === undefined || allPositions === undefined;
  return { loading, site: live, supports, hazards, positions, measurements, photos, features, project, siteSpanM };
}
