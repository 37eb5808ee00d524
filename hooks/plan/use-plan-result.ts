import { useEffect, useMemo, useState } from 'react';
import type { PlanResult } from '@/shared/plan';
import type { SiteFile } from '@/shared/schemas/site-file';
import { computePlan, planComputedIn } from './plan-compute';

/** `computedIn` says whether the plan ran in the background worker or, where none could start, on the main thread. */
export type PlanState =
  | { status: 'idle' }
  | { status: 'computing' }
  | { status: 'done'; result: PlanResult; computedIn: 'worker' | 'main-thread' }
  | { status: 'failed'; message: string };

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
      (result) => live && setState({ status: 'done', result, computedIn: planComputedIn() }),
      (err: Error) => live && setState({ status: 'failed', message: err.message }),
    );
    return () => {
      live = false;
    };
  }, [key]);
  return state;
}
