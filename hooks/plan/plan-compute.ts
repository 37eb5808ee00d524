import { Platform } from 'react-native';
import { planSite, type PlanResult } from '@/shared/plan';
import type { SiteFile } from '@/shared/schemas/site-file';
import { PLAN_WORKER_VERSION, planReplySchema } from './plan-messages';

/*
 * Runs planSite off the main thread on the web (the bundled /plan-worker.js), and on the main thread only
 * where no worker can start (native, or a dev server that did not build the worker file). One worker is
 * kept for the session; a newer request makes older answers irrelevant, the caller ignores them.
 */

let worker: Worker | null = null;
let workerBroken = false;
let nextId = 1;
const waiting = new Map<number, { resolve: (r: PlanResult) => void; reject: (e: Error) => void }>();

function startWorker(): Worker | null {
  if (workerBroken || Platform.OS !== 'web' || typeof Worker === 'undefined') return null;
  if (worker) return worker;
  try {
    worker = new Worker('/plan-worker.js');
  } catch {
    workerBroken = true;
    return null;
  }
  worker.onmessage = (e: MessageEvent) => {
    const reply = planReplySchema.safeParse(e.data);
    if (!reply.success) return;
    const w = waiting.get(reply.data.id);
    if (!w) return;
    waiting.delete(reply.data.id);
    if (reply.data.type === 'planned') w.resolve(reply.data.result as PlanResult);
    else w.reject(new Error(reply.data.message));
  };
  worker.onerror = (e) => {
    // The script is missing (dev server) or failed to load: plan on the main thread from now on.
    e.preventDefault?.();
    workerBroken = true;
    worker?.terminate();
    worker = null;
    const pending = [...waiting.values()];
    waiting.clear();
    for (const p of pending) p.reject(new WorkerUnavailable());
  };
  return worker;
}

class WorkerUnavailable extends Error {}

/** Where the last plan was computed, shown beside the "computing" state for the curious. */
export function planComputedIn(): 'worker' | 'main-thread' {
  return worker && !workerBroken ? 'worker' : 'main-thread';
}

function onMainThread(file: SiteFile): Promise<PlanResult> {
  // Yield one frame first so the "computing" state is painted before the engine takes the thread.
  return new Promise((resolve, reject) => setTimeout(() => {
    try {
      resolve(planSite(file));
    } catch (err) {
      reject(err instanceof Error ? err : new Error(String(err)));
    }
  }, 30));
}

export function computePlan(file: SiteFile): Promise<PlanResult> {
  const w = startWorker();
  if (!w) return onMainThread(file);
  const id = nextId++;
  return new Promise<PlanResult>((resolve, reject) => {
    waiting.set(id, { resolve, reject });
    w.postMessage({ v: PLAN_WORKER_VERSION, id, type: 'plan', file });
  }).catch((err) => (err instanceof WorkerUnavailable ? onMainThread(file) : Promise.reject(err)));
}
