import { z } from 'zod';
import type { Role } from './roles';

/*
 * The e-mails Loftline sends about the safety review, and each person's choice of which to receive (per club).
 * Every kind is on until the person turns it off.
 */

export const NOTIFICATION_KINDS = ['reviewWaiting', 'spotSentBack', 'spotCleared', 'sheetReady'] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

/** Who hears of each kind: the safety officer reviews, the lead plans, the crews raise the antennas. */
export const NOTIFICATION_ROLES: Record<NotificationKind, readonly Role[]> = {
  reviewWaiting: ['safety'],
  spotSentBack: ['lead'],
  spotCleared: ['lead'],
  sheetReady: ['crew'],
};

export const NOTIFICATION_LABELS: Record<NotificationKind, { title: string; hint: string }> = {
  reviewWaiting: { title: 'Spots waiting for review', hint: 'When the lead sends antenna spots to the safety review.' },
  spotSentBack: { title: 'Spots sent back', hint: 'When the safety review sends a spot back to be moved or changed.' },
  spotCleared: { title: 'Spots cleared', hint: 'When every clearance on a spot has been accepted.' },
  sheetReady: { title: 'Antenna sheets ready', hint: 'When a spot is cleared and its crew sheet can be used on the day.' },
};

/** PUT /api/clubs/:clubId/notification-settings: every kind, on or off. */
export const notificationSettingsSchema = z.strictObject({
  reviewWaiting: z.boolean({ message: 'reviewWaiting must be true or false' }),
  spotSentBack: z.boolean({ message: 'spotSentBack must be true or false' }),
  spotCleared: z.boolean({ message: 'spotCleared must be true or false' }),
  sheetReady: z.boolean({ message: 'sheetReady must be true or false' }),
});
export type NotificationSettings = z.infer<typeof notificationSettingsSchema>;

export const DEFAULT_NOTIFICATION_SETTINGS: NotificationSettings = { reviewWaiting: true, spotSentBack: true, spotCleared: true, sheetReady: true };

/** GET (and PUT's answer): the person's settings and the kinds their role in the club receives. */
export const notificationSettingsResponseSchema = z.strictObject({
  settings: notificationSettingsSchema,
  forRole: z.array(z.enum(NOTIFICATION_KINDS)),
});
export type NotificationSettingsResponse = z.infer<typeof notificationSettingsResponseSchema>;

export function notificationKindsForRole(role: Role): NotificationKind[] {
  return NOTIFICATION_KINDS.filter((k) => NOTIFICATION_ROLES[k].includes(role));
}
