/*
 * The planning Web Worker: bundled on its own by esbuild into the web export as /plan-worker.js
 * (server/src/dev/build-web.ts). It imports only the pure engine, never React.
 */
import { planSite } from '../../shared/plan';
import { siteFileSchema } from '../../shared/schemas/site-file';
import { PLAN_WORKER_VERSION, planRequestSchema, type PlanReply } from './plan-messages';

type WorkerScope = { onmessage: ((e: MessageEvent) => void) | null; postMessage: (m: PlanReply) => void };
const scope = self as unknown as WorkerScope;

scope.onmessage = (e: MessageEvent) => {
  const req = planRequestSchema.safeParse(e.data);
  if (!req.success) return;
  try {
    const file = siteFileSchema.parse(req.data.file);
    scope.postMessage({ v: PLAN_WORKER_VERSION, id: req.data.id, type: 'planned', result: planSite(file) });
  } catch (err) {
    scope.postMessage({ v: PLAN_WORKER_VERSION, id: req.data.id, type: 'failed', message: err instanceof Error ? err.message : String(err) });
  }
};
