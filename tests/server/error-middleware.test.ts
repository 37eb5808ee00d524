// The one error middleware (server/src/http/error-middleware.ts): every failure is {code, message, details?} with
// the status chosen from the error's kind; an unexpected error is a plain 500 that leaks neither message nor stack.
import express from 'express';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { pino } from 'pino';
import { z } from 'zod';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppError, STATUS_OF_KIND, type ErrorKind } from '../../server/src/http/errors';
import { errorMiddleware } from '../../server/src/http/error-middleware';
import { validate } from '../../server/src/http/validate';

let server: Server;
let base: string;
const logged: unknown[] = [];

beforeAll(async () => {
  const app = express();
  app.use(express.json());
  app.get('/boom', () => {
    throw new Error('secret detail at /srv/app.ts:12');
  });
  app.get('/async-boom', async () => {
    await Promise.resolve();
    throw new TypeError('undefined is not a function');
  });
  app.get('/kind/:kind', (req) => {
    throw new AppError('some_code', req.params.kind as ErrorKind, 'explained', { hint: 1 });
  });
  app.post('/validated/:n', validate({ params: z.object({ n: z.coerce.number().int() }), body: z.strictObject({ a: z.string() }) }), (req, res) => {
    res.json({ n: req.params.n, a: req.body.a });
  });
  const logger = pino({ level: 'error' }, { write: (line: string) => void logged.push(JSON.parse(line)) });
  app.use(errorMiddleware(logger));
  server = app.listen(0, '127.0.0.1');
  await new Promise((ok) => server.once('listening', ok));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((ok) => server.close(() => ok())));

describe('error middleware', () => {
  it.each(['/boom', '/async-boom'])('%s: an unexpected error answers 500 internal_error, logged with its stack, sent without it', async (path) => {
    const before = logged.length;
    const res = await fetch(`${base}${path}`);
    expect(res.status).toBe(500);
    const body = await res.json();
    expect(body).toEqual({ code: 'internal_error', message: expect.any(String) });
    expect(JSON.stringify(body)).not.toMatch(/secret|undefined is not|\.ts:/);
    expect(logged.length).toBe(before + 1);
    expect(JSON.stringify(logged.at(-1))).toMatch(/stack/);
  });

  it.each(Object.entries(STATUS_OF_KIND))('an AppError of kind %s answers %i with its code, message and details', async (kind, status) => {
    const res = await fetch(`${base}/kind/${kind}`);
    expect(res.status).toBe(status);
    expect(await res.json()).toEqual({ code: 'some_code', message: 'explained', details: { hint: 1 } });
  });

  it('validate() hands the parsed params and body to the handler', async () => {
    const res = await fetch(`${base}/validated/42`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{"a":"x"}' });
    expect(await res.json()).toEqual({ n: 42, a: 'x' });
  });

  it('validate() failures answer 400 validation_failed listing every bad path', async () => {
    const res = await fetch(`${base}/validated/zz`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{"a":1}' });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.code).toBe('validation_failed');
    expect(body.details.issues.map((i: { path: string }) => i.path)).toEqual(['a']);
    // params are checked after the body; a second request shows the param path.
    const res2 = await fetch(`${base}/validated/zz`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{"a":"ok"}' });
    expect((await res2.json()).details.issues.map((i: { path: string }) => i.path)).toEqual(['n']);
  });
});
