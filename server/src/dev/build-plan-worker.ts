import path from 'node:path';
import { build } from 'esbuild';

/*
 * The planning Web Worker (hooks/plan/plan-worker-entry.ts) bundled on its own into the web export as
 * /plan-worker.js: Metro builds one app bundle, so the worker is built beside it with esbuild (already in
 * node_modules through tsx). It runs before the service-worker step, so it is precached and plans offline.
 */
const repoRoot = path.resolve(__dirname, '../../..');

export async function buildPlanWorker(outDir: string): Promise<string> {
  const outfile = path.join(outDir, 'plan-worker.js');
  await build({
    entryPoints: [path.join(repoRoot, 'hooks/plan/plan-worker-entry.ts')],
    bundle: true,
    format: 'iife',
    platform: 'browser',
    target: 'es2020',
    minify: true,
    outfile,
    logLevel: 'warning',
  });
  return outfile;
}
