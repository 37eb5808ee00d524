import { z } from 'zod';

/** The five club roles. A person may hold a different role in each club they belong to. */
export const ROLES = ['admin', 'lead', 'safety', 'scout', 'crew'] as const;
export const roleSchema = z.enum(ROLES, { message: `role must be one of ${ROLES.join(', ')}` });
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Club admin',
  lead: 'Lead',
  safety: 'Safety officer',
  scout: 'Scout',
  crew: 'Crew',
};

/**
 * What each role may do. Reading a club's data needs only membership; these are the writes.
 * The server enforces them on every route and on every sync mutation; the app uses them to hide controls.
 */
export const ABILITIES = [
  'club.manage', // rename the club, invite, change roles, remove members
  'event.write', // create and edit events and sites
  'survey.write', // supports, measurements, hazards, operating positions, ground, site notes, photos
  'plan.write', // stations, coax inventory, antenna spots and assignments
  'review.decide', // accept or send back clearance results
  'spot.status', // mark a cleared spot up or down, record measured SWR
] as const;
export type Ability = (typeof ABILITIES)[number];

const GRANTS: Record<Role, readonly Ability[]> = {
  // An admin manages people and plans, but does not decide safety reviews: the separation between the person
  // who plans a spot and the person who accepts its clearances is kept even for admins.
  admin: ['club.manage', 'event.write', 'survey.write', 'plan.write', 'spot.status'],
  lead: ['event.write', 'survey.write', 'plan.write', 'spot.status'],
  safety: ['review.decide', 'survey.write'],
  scout: ['survey.write'],
  crew: ['spot.status'],
};

export function can(role: Role, ability: Ability): boolean {
  return GRANTS[role].includes(ability);
}
