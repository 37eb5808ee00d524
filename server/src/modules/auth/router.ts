// /api/auth/* and /api/me. Thin: validate, call the service, answer.
import { Router, type Request, type RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import {
  forgotPasswordSchema,
  refreshSchema,
  resetPasswordSchema,
  signInSchema,
  signUpSchema,
} from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireUser } from '../../http/auth';
import { AppError } from '../../http/errors';
import { validate } from '../../http/validate';
import { AuthService } from './service';

/** Shortest time a forgot-password answer takes, known address or not (well above the work a known one does). */
export const FORGOT_PASSWORD_MIN_MS = 250;

function emailKey(req: Request): string | null {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' && email.trim() ? `email:${email.trim().toLowerCase()}` : null;
}

/** Two limits on the same route: per client address and per e-mail address (a spread-out guessing run). */
function attemptLimits(deps: AppDeps, what: string, countSuccesses: boolean): RequestHandler[] {
  const { max, ipMax, windowMs } = deps.config.authRateLimit;
  const minutes = Math.ceil(windowMs / 60_000);
  const handler: RequestHandler = (_req, _res, next) =>
    next(new AppError('rate_limited', 'rate_limited', `too many ${what} attempts: wait ${minutes} minutes and try again`));
  const common = { windowMs, standardHeaders: 'draft-8', legacyHeaders: false, skipSuccessfulRequests: !countSuccesses, handler } as const;
  return [
    rateLimit({ ...common, limit: ipMax }),
    rateLimit({ ...common, limit: max, keyGenerator: (req) => emailKey(req) ?? 'no-email', skip: (req) => emailKey(req) === null }),
  ];
}

export function authRouter(deps: AppDeps): Router {
  const router = Router();
  const auth = new AuthService(deps);

  router.post('/auth/sign-up', validate({ body: signUpSchema }), async (req, res) => {
    res.status(201).json(await auth.signUp(req.body));
  });
  router.post('/auth/sign-in', ...attemptLimits(deps, 'sign-in', false), validate({ body: signInSchema }), async (req, res) => {
    res.json(await auth.signIn(req.body));
  });
  router.post('/auth/refresh', validate({ body: refreshSchema }), async (req, res) => {
    res.json(await auth.refresh(req.body.refreshToken));
  });
  router.post('/auth/sign-out', validate({ body: refreshSchema }), async (req, res) => {
    await auth.signOut(req.body.refreshToken);
    res.status(204).end();
  });
  router.post('/auth/forgot-password', ...attemptLimits(deps, 'password reset', true), validate({ body: forgotPasswordSchema }), async (req, res) => {
    // The same answer, after at least the same time, whether or not the address has an account (the known
    // address's two writes take a few ms more): the answer's timing does not tell who is a member.
    const started = Date.now();
    await auth.forgotPassword(req.body.email);
    const left = FORGOT_PASSWORD_MIN_MS - (Date.now() - started);
    if (left > 0) await new Promise((done) => setTimeout(done, left));
    res.status(202).json({ message: 'if an account has this e-mail, a reset link is on its way' });
  });
  router.post('/auth/reset-password', validate({ body: resetPasswordSchema }), async (req, res) => {
    await auth.resetPassword(req.body.token, req.body.password);
    res.status(204).end();
  });
  router.get('/me', requireUser(deps), async (req, res) => {
    res.json(await auth.me((req.user as Express.User).id));
  });
  return router;
}
