// Starts one private PostgreSQL cluster for the whole server test run (under /tmp, on a free port), migrates a
// template database once, and hands the connection details to the tests (inject('pg')). Each test app clones the
// template (CREATE DATABASE … TEMPLATE), which takes a fraction of a second.
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { createDataSource, openAndMigrate } from '../../server/src/db/data-source';
import { startCluster } from '../../server/src/dev/pg-cluster';

export const TEMPLATE_DB = 'loftline_template';

export interface ProvidedPg {
  /** postgres://postgres@127.0.0.1:<port>/ (append a database name). */
  baseUrl: string;
  templateDb: string;
}

declare module 'vitest' {
  export interface ProvidedContext {
    pg: ProvidedPg;
  }
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const root = mkdtempSync(join(tmpdir(), 'loftline-test-pg-'));
  chmodSync(root, 0o755); // mkdtemp makes it 0700; the postgres OS user must be able to enter it
  const cluster = await startCluster({ dataDir: join(root, 'data') });
  cluster.stopWhenGone(process.pid, [cluster.dataDir, root]); // a run killed before teardown leaves no server behind
  try {
    await cluster.ensureDatabase(TEMPLATE_DB);
    const ds = createDataSource({ url: cluster.url(TEMPLATE_DB), poolSize: 1 });
    await openAndMigrate(ds);
    await ds.destroy(); // a template with open connections cannot be cloned
  } catch (err) {
    await cluster.stop();
    throw err;
  }
  project.provide('pg', { baseUrl: cluster.url(''), templateDb: TEMPLATE_DB });
  // Tests that start their own stack (startStack) run beside this cluster; they pick their own ports.
  process.env.LOFTLINE_TEST_PG_URL = cluster.url('');
  return async () => {
    await cluster.stop();
    rmSync(cluster.dataDir, { recursive: true, force: true });
    rmSync(root, { recursive: true, force: true });
  };
}
