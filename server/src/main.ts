// Production entry (`npm run serve`): the server on an existing database (DATABASE_URL) or the private cluster in
// DATA_DIR, serving the already-built web app in dist/. Unlike `npm start` it never builds the web app and loads
// the demo scenario only when SEED_DEMO=1.
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { loadConfigOrReport } from './config';
import { startStack, stopOnSignal } from './dev/stack';

async function main(): Promise<number> {
  const config = loadConfigOrReport();
  if (!config) return 2;
  const webDir = resolve(process.env.WEB_DIR ?? join(__dirname, '../../dist'));
  if (!existsSync(join(webDir, 'index.html'))) console.warn(`loftline: no web build in ${webDir} (npm run build:web); serving the API only`);
  const stack = await startStack({
    dataDir: config.dataDir,
    port: config.port,
    host: config.host,
    webDir,
    seedDemo: process.env.SEED_DEMO === '1',
    mail: config.mail.transport,
  });
  console.log(`loftline: serving ${stack.url}${stack.migrated.length ? ` (applied ${stack.migrated.length} migrations)` : ''}`);
  await stopOnSignal(() => stack.stop());
  return 0;
}

main().then(
  (code) => process.exit(code),
  (err: unknown) => {
    console.error(`loftline: could not start: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  },
);
