// The service-worker build over a stand-in export folder (the real export is covered by tests/e2e/offline-*):
// every shell file is in the precache manifest with a revision, source maps are not, big bundles are not dropped.
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildServiceWorker } from './build-service-worker';

describe('buildServiceWorker (workbox InjectManifest after the export)', () => {
  let dir: string;
  let sw: string;
  /** The precache manifest as InjectManifest wrote it into sw.js: url → revision (null for hashed names). */
  let manifest: Map<string, string | null>;
  const bundle = '_expo/static/js/web/entry-0123456789abcdef0123456789abcdef.js';
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'loftline-sw-build-'));
    const files: Record<string, string | Buffer> = {
      'index.html': '<!doctype html><div id="root"></div>',
      [bundle]: `console.log(${JSON.stringify('x'.repeat(3_000_000))});`, // over workbox's default 2 MiB limit
      [`${bundle}.map`]: '{}',
      'assets/node_modules/@expo-google-fonts/inter/400Regular/Inter_400Regular.abc123.ttf': Buffer.alloc(300_000, 1),
      'manifest.webmanifest': '{"name":"Loftline"}',
      'icons/icon-192.png': Buffer.alloc(100, 2),
      'metadata.json': '{}',
    };
    for (const [name, content] of Object.entries(files)) {
      mkdirSync(join(dir, name, '..'), { recursive: true });
      writeFileSync(join(dir, name), content);
    }
    const built = await buildServiceWorker(dir);
    sw = readFileSync(built.swPath, 'utf8');
    manifest = new Map([...sw.matchAll(/\{'revision':(?:'([0-9a-f]+)'|null),'url':'([^']+)'\}/g)].map((m) => [m[2]!, m[1] ?? null]));
    expect(built.precachedFiles).toBe(5);
  }, 120_000);
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('precaches the shell, the bundle, fonts, icons and the manifest, each with a revision or a hashed name', () => {
    expect([...manifest.keys()].sort()).toEqual(
      [`/${bundle}`, '/assets/node_modules/@expo-google-fonts/inter/400Regular/Inter_400Regular.abc123.ttf', '/icons/icon-192.png', '/index.html', '/manifest.webmanifest'].sort(),
    );
    expect(manifest.get('/index.html')).toMatch(/^[0-9a-f]{32}$/);
    expect(manifest.get(`/${bundle}`)).toBeNull(); // the content hash is in the name
  });

  it('leaves out source maps, build metadata and the worker itself', () => {
    expect([...manifest.keys()].filter((u) => u.endsWith('.map') || u.includes('metadata') || u.endsWith('sw.js'))).toEqual([]);
  });

  it('keeps the exported files unchanged (copied into the compilation, not minified again)', () => {
    expect(readFileSync(join(dir, bundle), 'utf8').startsWith('console.log("xxx')).toBe(true);
  });

  it('keeps /api out of any cache (network only) and answers page addresses with index.html', () => {
    expect(sw).toContain('/api/');
    expect(sw).toContain('SKIP_WAITING');
  });
});
