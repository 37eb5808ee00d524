import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { addReadingWhereStanding, averaged, type AveragedFix, type Fix } from '@/components/survey/placement/placement-logic';
import { surveyGeo } from '@/components/survey/placement/survey-geo';
import type { PositionReading } from './use-position';

/**
 * Collects the position readings that arrive while `running`, and their accuracy-weighted average.
 * Restarting clears them: a fix belongs to one place the scout stood.
 */
export function useFixAveraging(latest: PositionReading | null, running: boolean): { readings: Fix[]; fix: AveragedFix | null; restart: () => void } {
  const [readings, setReadings] = useState<Fix[]>([]);
  const startedAt = useRef(Date.now());
  useEffect(() => {
    if (running && latest) setReadings((rs) => addReadingWhereStanding(rs, latest, startedAt.current, surveyGeo));
  }, [latest, running]);
  const fix = useMemo(() => averaged(readings, surveyGeo), [readings]);
  const restart = useCallback(() => {
    startedAt.current = Date.now();
    setReadings([]);
  }, []);
  return { readings, fix, restart };
}
