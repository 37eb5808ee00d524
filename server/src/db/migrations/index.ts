// Every migration, in the order it runs. Add yours as a new file `<13-digit-ms-timestamp>-<name>.ts` and append
// its class here (classes, not globs: TypeORM's glob loading does not work under tsx).
import { InitialSchema1796163364737 } from './1796163364737-initial-schema';
import { PhotoUploads1796163535135 } from './1796163535135-photo-uploads';
import { SyncBookkeeping1796170000000 } from './1796170000000-sync-bookkeeping';
import { Notifications1796180000000 } from './1796180000000-notifications';
import { SpotLegsAndCrews1796190000000 } from './1796190000000-spot-legs-and-crews';
import { SyncProblemResolution1796200000000 } from './1796200000000-sync-problem-resolution';

export const MIGRATIONS = [InitialSchema1796163364737, PhotoUploads1796163535135, SyncBookkeeping1796170000000, Notifications1796180000000, SpotLegsAndCrews1796190000000, SyncProblemResolution1796200000000];
