import { useEffect, useMemo, useState } from 'react';
import type { PlanResult } from '@/shared/plan';
import type { SiteFile } from '@/shared/schemas/site-file';
import { computePlan } from './plan-compute';

export type PlanState = { status: 'idle' } | { status: 'computing' } | { status: 'done'; result: PlanResult } | { status: 'failed'; message: string };

/** The engine's plan for a site file, recomputed (off the main thread on the web) whenever the file changes. */
export function usePlanResult(file: SiteFile | null): PlanState {
  const key = useMemo(() => (file ? JSON.stringify(file) : ''), [file]);
  const [state, setState] = useState<PlanState>({ status: 'idle' });
  useEffect(() => {
    if (!key) {
      setState({ status: 'idle' });
      return;
    }
    const parsed = JSON.parse(key) as SiteFile;
    if (parsed.stations.length === 0) {
      setState({ status: 'idle' });
      return;
    }
    let live = true;
    setState({ status: 'computing' });
    computePlan(parsed).then(
      (result) => live && setState({ status: 'done', result }),
      (err: Error) => live && setState({ status: 'failed', message: err.message }),
    );
    return () => {
      live = false;
    };
  }, [key]);
  return state;
}
