// What other modules may do once a push's changes are written, inside the push's transaction: each hook sees every
// row the push changed, before and after. A hook's writes (e.g. a queued e-mail) commit or roll back with the push.
// A failing hook is rolled back to a savepoint and logged, so a broken side effect never refuses anyone's data.
import type { Logger } from 'pino';
import type { EntityManager } from 'typeorm';
import type { RowState } from './row-codec';

export interface AppliedChange {
  /** The row as stored before this push; null when the push created it. */
  before: RowState | null;
  after: RowState;
}

export interface AppliedPush {
  clubId: string;
  /** Who pushed (the member whose device sent the batch). */
  userId: string;
  nowMs: number;
  changes: readonly AppliedChange[];
}

export type AfterApplyHook = {
  /** Names the hook in the log when it fails. */
  name: string;
  run(em: EntityManager, push: AppliedPush): Promise<void>;
};

export async function runAfterApply(em: EntityManager, hooks: readonly AfterApplyHook[], push: AppliedPush, logger: Logger): Promise<void> {
  if (push.changes.length === 0) return;
  for (const hook of hooks) {
    await em.query('SAVEPOINT after_apply_hook');
    try {
      await hook.run(em, push);
      await em.query('RELEASE SAVEPOINT after_apply_hook');
    } catch (err) {
      await em.query('ROLLBACK TO SAVEPOINT after_apply_hook');
      logger.error({ err, hook: hook.name, clubId: push.clubId }, 'sync: an after-apply hook failed; the push is kept without it');
    }
  }
}
