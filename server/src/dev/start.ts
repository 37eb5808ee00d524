// `npm start`: builds the web app when dist/ is missing or older than its sources, starts the whole stack
// (private PostgreSQL in ${DATA_DIR}/pg, demo data on first start), prints where to go, stops cleanly on Ctrl-C.
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { loadConfigOrReport } from '../config';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-scenario';
import { startStack, stopOnSignal } from './stack';

const ROOT = resolve(__dirname, '../../..');
const WEB_DIR = join(ROOT, 'dist');
/** What the web export is built from: a change to any of these makes the next start rebuild. */
const WEB_SOURCES = ['app', 'components', 'hooks', 'constants', 'shared', 'sync', 'assets', 'public', 'app.json', 'package.json', 'babel.config.js', 'metro.config.js'];

function newestMtimeMs(path: string): number {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const entry of readdirSync(path)) {
    if (entry === 'node_modules' || entry.startsWith('.')) continue;
    newest = Math.max(newest, newestMtimeMs(join(path, entry)));
  }
  return newest;
}

export function webBuildIsStale(webDir = WEB_DIR): boolean {
  const index = join(webDir, 'index.html');
  if (!existsSync(index)) return true;
  const built = statSync(index).mtimeMs;
  return WEB_SOURCES.some((s) => newestMtimeMs(join(ROOT, s)) > built);
}

async function buildWebIfNeeded(): Promise<void> {
  if (process.env.SKIP_WEB_BUILD === '1') return;
  if (!webBuildIsStale()) return;
  const builder = join(__dirname, 'build-web.ts');
  if (!existsSync(builder)) {
    console.warn('loftline: no web build script (server/src/dev/build-web.ts); serving the API only');
    return;
  }
  console.log('loftline: building the web app (first start or changed sources)…');
  const t0 = Date.now();
  const { buildWeb } = (await import(builder)) as { buildWeb: (o: { outDir: string; quiet?: boolean }) => Promise<unknown> };
  await buildWeb({ outDir: WEB_DIR, quiet: true });
  console.log(`loftline: web app built in ${((Date.now() - t0) / 1000).toFixed(1)} s`);
}

async function main(): Promise<number> {
  const t0 = Date.now();
  const config = loadConfigOrReport();
  if (!config) return 2;
  await buildWebIfNeeded();
  const stack = await startStack({
    dataDir: config.dataDir,
    port: config.port,
    host: config.host,
    webDir: existsSync(join(WEB_DIR, 'index.html')) ? WEB_DIR : undefined,
    seedDemo: process.env.SEED_DEMO !== '0',
    mail: config.mail.transport,
  });

  const lines = [
    '',
    `Loftline is running at ${stack.url}  (started in ${((Date.now() - t0) / 1000).toFixed(1)} s)`,
    `  data folder: ${config.dataDir}${stack.demo?.created ? '  (new: demo scenario loaded)' : ''}`,
    stack.mailboxDir ? `  mail: fake mailbox at ${stack.url}/api/dev/mailbox (files in ${stack.mailboxDir})` : `  mail: SMTP via ${config.mail.smtp?.host}`,
    `  demo users (password "${DEMO_PASSWORD}"): ${DEMO_USERS.map((u) => `${u.email} (${u.role})`).join(', ')}`,
    '  Ctrl-C stops it; the data stays for the next start.',
    '',
  ];
  console.log(lines.join('\n'));

  await stopOnSignal(() => stack.stop());
  console.log('loftline: stopped');
  return 0;
}

if (require.main === module) {
  main().then(
    (code) => process.exit(code),
    (err: unknown) => {
      console.error(`loftline: could not start: ${err instanceof Error ? err.message : String(err)}`);
      process.exit(1);
    },
  );
}
