// GET/PUT /api/clubs/:clubId/notification-settings: the signed-in member's own choice of review e-mails in this club.
// Any member may read and change their own settings (no ability beyond membership); nobody sees anyone else's.
import { Router } from 'express';
import { notificationKindsForRole, notificationSettingsSchema, type NotificationSettingsResponse } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireMembership, requireUser } from '../../http/auth';
import { validate } from '../../http/validate';
import { readSettings, writeSettings } from './notification-repository';

export function notificationSettingsRouter(deps: AppDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(requireUser(deps), requireMembership(deps));

  router.get('/', async (req, res) => {
    const m = req.membership!;
    const settings = await readSettings(deps.dataSource, m.clubId, m.userId);
    res.json({ settings, forRole: notificationKindsForRole(m.role) } satisfies NotificationSettingsResponse);
  });

  router.put('/', validate({ body: notificationSettingsSchema }), async (req, res) => {
    const m = req.membership!;
    await writeSettings(deps.dataSource, m.clubId, m.userId, req.body, deps.clock.now().toISOString());
    res.json({ settings: await readSettings(deps.dataSource, m.clubId, m.userId), forRole: notificationKindsForRole(m.role) } satisfies NotificationSettingsResponse);
  });
  return router;
}
