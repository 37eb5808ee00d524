import { spawn } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildServiceWorker } from './build-service-worker';
import { buildPlanWorker } from './build-plan-worker';

/*
 * Builds the web app with `expo export` into a folder the server can serve from the same origin.
 * Later steps (the service worker) extend buildWeb() after the export.
 */

const repoRoot = path.resolve(__dirname, '../../..');

/**
 * Metro caches transformed files in os.tmpdir()/metro-cache without keying on EXPO_PUBLIC_* values, so a test build
 * (EXPO_PUBLIC_LOFTLINE_E2E=1, see components/offline/e2e-hooks.tsx) and a production build must not share that
 * cache: the test build gets a temp folder of its own, and a production build never picks up the test hook.
 */
function testBuildTmp(): { TMPDIR?: string } {
  if (process.env.EXPO_PUBLIC_LOFTLINE_E2E !== '1') return {};
  const dir = path.join(os.tmpdir(), 'loftline-test-build-tmp');
  mkdirSync(dir, { recursive: true });
  return { TMPDIR: dir };
}

export type BuildWebOptions = { outDir: string; quiet?: boolean };

export async function exportWeb({ outDir, quiet }: BuildWebOptions): Promise<void> {
  const expoBin = path.join(repoRoot, 'node_modules', '.bin', 'expo');
  if (!existsSync(expoBin)) throw new Error(`expo is not installed at ${expoBin}; run npm ci first`);
  await new Promise<void>((resolve, reject) => {
    const child = spawn(expoBin, ['export', '--platform', 'web', '--output-dir', outDir], {
      cwd: repoRoot,
      // CI=1 keeps expo non-interactive; EXPO_OFFLINE stops it asking the network for anything.
      env: { ...process.env, CI: '1', EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1', ...testBuildTmp() },
      stdio: quiet ? ['ignore', 'pipe', 'pipe'] : 'inherit',
    });
    let output = '';
    child.stdout?.on('data', (d: Buffer) => (output += d.toString()));
    child.stderr?.on('data', (d: Buffer) => (output += d.toString()));
    child.on('error', reject);
    child.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`expo export failed with exit code ${code}\n${output.slice(-4000)}`))));
  });
}

/** The whole web build: export, then any post-export steps appended below. */
export async function buildWeb(options: BuildWebOptions): Promise<{ outDir: string }> {
  const outDir = path.resolve(repoRoot, options.outDir);
  await exportWeb({ ...options, outDir });
  // The planning Web Worker (H7), bundled on its own; before the service worker so it is precached.
  await buildPlanWorker(outDir);
  // The service worker (H5b) precaches what the export wrote, so it must run last.
  await buildServiceWorker(outDir);
  return { outDir };
}

function parseArgs(argv: string[]): BuildWebOptions {
  let outDir = 'dist';
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--out' || a === '--output-dir') {
      const v = argv[++i];
      if (!v) throw new Error(`${a} needs a folder`);
      outDir = v;
    } else throw new Error(`unknown argument ${a}; usage: npm run build:web [-- --out <dir>]`);
  }
  return { outDir };
}

if (require.main === module) {
  let opts: BuildWebOptions;
  try {
    opts = parseArgs(process.argv.slice(2));
  } catch (e) {
    console.error((e as Error).message);
    process.exit(2);
  }
  buildWeb(opts).then(
    ({ outDir }) => console.log(`web app built into ${outDir}`),
    (e: Error) => {
      console.error(e.message);
      process.exit(1);
    },
  );
}
