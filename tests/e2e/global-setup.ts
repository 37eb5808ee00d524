import { chmod, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { buildWeb } from '../../server/src/dev/build-web';
import { startStack } from '../../server/src/dev/stack';

/*
 * The whole product for the browser tests: the web app exported into a temp folder (or LOFTLINE_WEB_DIST
 * when set, to skip the build), then startStack on a free port with its own PostgreSQL cluster, the demo
 * scenario and the fake mailbox, all under a fresh temp data folder. Torn down after the last test.
 */

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    mailboxDir: string;
  }
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const temps: string[] = [];
  // A test build: exposes the app's sync client to tests/e2e/offline-* (components/offline/e2e-hooks.tsx).
  process.env.EXPO_PUBLIC_LOFTLINE_E2E ??= '1';
  let webDir = process.env.LOFTLINE_WEB_DIST;
  if (!webDir) {
    webDir = await mkdtemp(path.join(tmpdir(), 'loftline-e2e-web-'));
    temps.push(webDir);
    await buildWeb({ outDir: webDir, quiet: true });
  }
  const dataDir = await mkdtemp(path.join(tmpdir(), 'loftline-e2e-data-'));
  temps.push(dataDir);
  // mkdtemp makes the folder 0700; the cluster runs as the postgres OS user, who must be able to enter it.
  await chmod(dataDir, 0o755);
  const stack = await startStack({ dataDir, port: 0, host: '127.0.0.1', webDir, seedDemo: true, mail: 'fake', env: { ...process.env, LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn' } });
  project.provide('baseUrl', stack.url);
  project.provide('mailboxDir', stack.mailboxDir ?? '');
  return async () => {
    await stack.stop();
    for (const t of temps) await rm(t, { recursive: true, force: true });
  };
}
