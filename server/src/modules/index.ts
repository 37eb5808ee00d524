// Every feature module, mounted under /api by app.ts. Add yours with one line.
// A mount with parameters (e.g. '/clubs/:clubId/sites') needs Router({ mergeParams: true }) in the module.
import type { Router } from 'express';
import type { AppDeps } from '../app-deps';
import { authRouter } from './auth/router';
import { healthRouter } from './health/router';
import { photosRouter } from './photos/router';

export interface Module {
  /** Path under /api ('' mounts the router's own paths directly under /api). */
  mount: string;
  router: (deps: AppDeps) => Router;
}

export const MODULES: Module[] = [
  { mount: '/health', router: healthRouter },
  { mount: '', router: authRouter },
  { mount: '/clubs/:clubId/photos', router: (deps) => photosRouter(deps) },
];
