// GET/PUT /api/clubs/:clubId/notification-settings: the signed-in member's own choice of review e-mails in this club.
// `forRole` lists the kinds the person hears of: their role's, plus "sheet ready" when a station names them as crew.
// Any member may read and change their own settings (no ability beyond membership); nobody sees anyone else's.
import { Router } from 'express';
import { NOTIFICATION_KINDS, notificationKindsForRole, notificationSettingsSchema, type NotificationKind, type NotificationSettingsResponse } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireMembership, requireUser } from '../../http/auth';
import { validate } from '../../http/validate';
import { isNamedCrew, readSettings, writeSettings } from './notification-repository';

export function notificationSettingsRouter(deps: AppDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(requireUser(deps), requireMembership(deps));

  /** The kinds this person hears of: their role's, and "sheet ready" too when a station names them as its crew. */
  const kindsFor = async (clubId: string, userId: string, role: Parameters<typeof notificationKindsForRole>[0]): Promise<NotificationKind[]> => {
    const kinds = new Set(notificationKindsForRole(role));
    if (!kinds.has('sheetReady') && (await isNamedCrew(deps.dataSource, clubId, userId))) kinds.add('sheetReady');
    return NOTIFICATION_KINDS.filter((k) => kinds.has(k));
  };

  router.get('/', async (req, res) => {
    const m = req.membership!;
    const settings = await readSettings(deps.dataSource, m.clubId, m.userId);
    res.json({ settings, forRole: await kindsFor(m.clubId, m.userId, m.role) } satisfies NotificationSettingsResponse);
  });

  router.put('/', validate({ body: notificationSettingsSchema }), async (req, res) => {
    const m = req.membership!;
    await writeSettings(deps.dataSource, m.clubId, m.userId, req.body, deps.clock.now().toISOString());
    res.json({ settings: await readSettings(deps.dataSource, m.clubId, m.userId), forRole: await kindsFor(m.clubId, m.userId, m.role) } satisfies NotificationSettingsResponse);
  });
  return router;
}
