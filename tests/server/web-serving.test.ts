// The exported web app is served from the same origin as the API, with the client-side routes falling back to
// index.html, while /api keeps answering JSON.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './helpers/test-app';

const webDir = mkdtempSync(join(tmpdir(), 'loftline-web-test-'));

describe('web app serving', () => {
  let t: TestApp;
  beforeAll(async () => {
    writeFileSync(join(webDir, 'index.html'), '<!doctype html><title>Loftline test shell</title>');
    mkdirSync(join(webDir, '_expo', 'static', 'js'), { recursive: true });
    writeFileSync(join(webDir, '_expo', 'static', 'js', 'entry-abc.js'), 'console.log(1)');
    t = await startTestApp({ webDir });
  });
  afterAll(async () => {
    await t.close();
    rmSync(webDir, { recursive: true, force: true });
  });

  it('GET / serves index.html, marked no-cache', async () => {
    const r = await fetch(`${t.baseUrl}/`);
    expect(r.status).toBe(200);
    expect(await r.text()).toContain('Loftline test shell');
    expect(r.headers.get('cache-control')).toBe('no-cache');
  });

  it('a client-side route (/invite/<token>, /events/x/plan) falls back to index.html', async () => {
    for (const path of ['/invite/abc123', '/events/9/plan', '/sign-in']) {
      const r = await fetch(`${t.baseUrl}${path}`);
      expect(r.status, path).toBe(200);
      expect(await r.text()).toContain('Loftline test shell');
    }
  });

  it('bundles are served as files', async () => {
    const r = await fetch(`${t.baseUrl}/_expo/static/js/entry-abc.js`);
    expect(r.status).toBe(200);
    expect(r.headers.get('content-type')).toMatch(/javascript/);
  });

  it('/api paths never fall back to the web app', async () => {
    const r = await fetch(`${t.baseUrl}/api/nothing-here`);
    expect(r.status).toBe(404);
    expect((await r.json()).code).toBe('not_found');
  });

  it('a POST to a non-API path answers 404 JSON, not the page', async () => {
    const r = await fetch(`${t.baseUrl}/events`, { method: 'POST' });
    expect(r.status).toBe(404);
  });
});
