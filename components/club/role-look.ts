import { colors } from '@/constants/theme';
import type { IconName } from '@/constants/icons';
import { ROLE_LABELS, type Role } from '@/shared/schemas';

const ICONS: Record<Role, IconName> = { admin: 'people', lead: 'drafting', safety: 'shield', scout: 'tree', crew: 'clipboard' };

/** A role as a badge: its own icon and name on a neutral chip (roles are not states; no signal colours). */
export function roleLook(role: Role) {
  return { label: ROLE_LABELS[role], icon: ICONS[role], fg: colors.ink, bg: colors.surfaceSunk, border: colors.line };
}
