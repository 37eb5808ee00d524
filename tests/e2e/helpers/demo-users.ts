import type { Role } from '../../../shared/schemas';

/** The demo scenario's people (server/src/dev/demo-scenario.ts; README lists them). */
export const DEMO_PASSWORD = 'loftline-demo';
export const DEMO_USERS: Record<Role, string> = {
  admin: 'admin@kestrel.test',
  lead: 'lead@kestrel.test',
  safety: 'safety@kestrel.test',
  scout: 'scout@kestrel.test',
  crew: 'crew@kestrel.test',
};
export const DEMO_CLUB = 'Kestrel Ridge Amateur Radio Club';
export const DEMO_SITE = 'Alder Bend Meadows';
