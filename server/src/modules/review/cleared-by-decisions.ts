// Which spots a push of review decisions has just cleared to raise. A spot's review state is derived (from its
// results, decisions and inputs), never written by the safety officer's device, so the server works it out after
// the decisions are stored, inside the same transaction, for the notifications hook.
import type { EntityManager } from 'typeorm';
import type { AppliedPush } from '../sync/after-apply';
import { evaluateSpotOnServer } from './review-guard';

export async function spotsClearedByDecisions(em: EntityManager, push: AppliedPush): Promise<string[]> {
  const spotIds = new Set<string>();
  for (const { before, after } of push.changes) {
    if (after.collection === 'reviewDecisions' && before === null && after.deletedAt === null && after.fields.decision === 'accept') spotIds.add(String(after.fields.spotId));
  }
  const out: string[] = [];
  for (const id of spotIds) {
    const e = await evaluateSpotOnServer(em, push.clubId, id);
    if (typeof e !== 'string' && e.review.state === 'cleared' && e.spot.state !== 'planned') out.push(id);
  }
  return out;
}
