// Every feature module, mounted under /api by app.ts. Add yours with one line.
// A mount with parameters (e.g. '/clubs/:clubId/sites') needs Router({ mergeParams: true }) in the module.
import type { Router } from 'express';
import type { AppDeps } from '../app-deps';
import { authRouter } from './auth/router';
import { clubsRouter } from './clubs/router';
import { eventsRouter } from './events/router';
import { healthRouter } from './health/router';
import { clubInvitationsRouter } from './invitations/club-invitations-router';
import { publicInvitationsRouter } from './invitations/public-invitations-router';
import { devMailboxRouter } from './mail/dev-mailbox-router';
import { membersRouter } from './members/router';
import { notificationSettingsRouter } from './notifications/router';
import { photosRouter } from './photos/router';
import { sitesRouter } from './sites/router';
import { syncRouter } from './sync/router';

export interface Module {
  /** Path under /api ('' mounts the router's own paths directly under /api). */
  mount: string;
  router: (deps: AppDeps) => Router;
}

export const MODULES: Module[] = [
  { mount: '/health', router: healthRouter },
  { mount: '', router: authRouter },
  { mount: '/clubs/:clubId/photos', router: (deps) => photosRouter(deps) },
  { mount: '/clubs', router: clubsRouter },
  { mount: '/clubs/:clubId/members', router: membersRouter },
  { mount: '/clubs/:clubId/invitations', router: clubInvitationsRouter },
  { mount: '/invitations', router: publicInvitationsRouter },
  { mount: '/clubs/:clubId/sites', router: sitesRouter },
  { mount: '/clubs/:clubId/events', router: eventsRouter },
  { mount: '/dev/mailbox', router: devMailboxRouter },
  { mount: '/clubs/:clubId/sync', router: syncRouter },
  { mount: '/clubs/:clubId/notification-settings', router: notificationSettingsRouter },
];
