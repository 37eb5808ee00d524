import type { ClearanceLevel } from '../clearance/types';
import type { AntennaSpot, ReviewDecision, SpotState } from '../schemas/records';
import { fingerprintChanges } from './fingerprint';

/*
 * The safety review of one antenna spot, derived from its clearance results (computed now from the current
 * records), the decisions recorded against it (append-only) and its inputs fingerprint. Nothing here is
 * stored: the state everyone sees is recomputed from the same inputs on every device, so a phone offline
 * and the server agree once they hold the same records.
 *
 * Rules:
 *  - A decision applies only to the fingerprint it was made against; any change to the spot's supports,
 *    the site's hazards or its ground makes earlier decisions stale, and the spot goes back to review.
 *  - The latest decision for a result wins (decidedAt, then id); earlier ones are superseded, never edited.
 *  - A blocked result can be accepted by no one: the spot is sent back and must move.
 *  - A spot is cleared to raise only when every result on it has an accepting decision.
 */

export type ReviewResult = { key: string; level: ClearanceLevel; message: string; rule?: string; source?: string };

export type ResultReview = ReviewResult & {
  /** The decision in force for this result (made against the current inputs), if any. */
  decision: ReviewDecision | null;
  /** What this result still needs: a written acceptance, moving the spot, or nothing. */
  needs: 'accept-with-reason' | 'confirm' | 'move-spot' | 'nothing';
};

export type SpotReview = {
  state: SpotState;
  /** Plain lines saying why the spot is in this state, when it is not obvious. */
  reasons: string[];
  results: ResultReview[];
  pendingCount: number;
  blockedCount: number;
  /** Decisions that no longer apply because the inputs changed since they were made. */
  staleDecisionCount: number;
};

export type SpotReviewInputs = {
  spot: Pick<AntennaSpot, 'state' | 'inputsFingerprint' | 'stateReason'>;
  results: readonly ReviewResult[];
  decisions: readonly ReviewDecision[];
  currentFingerprint: string;
  supportLabels: readonly string[];
};

function later(a: ReviewDecision, b: ReviewDecision): boolean {
  if (a.decidedAt !== b.decidedAt) return a.decidedAt > b.decidedAt;
  return a.id > b.id;
}

export function reviewSpot(inputs: SpotReviewInputs): SpotReview {
  const { spot, results, currentFingerprint } = inputs;
  const live = inputs.decisions.filter((d) => d.deletedAt === null);
  const inForce = new Map<string, ReviewDecision>();
  let staleDecisionCount = 0;
  for (const d of live) {
    if (d.inputsFingerprint !== currentFingerprint) {
      staleDecisionCount++;
      continue;
    }
    const prev = inForce.get(d.resultKey);
    if (!prev || later(d, prev)) inForce.set(d.resultKey, d);
  }

  const reviewed: ResultReview[] = results.map((r) => {
    const decision = inForce.get(r.key) ?? null;
    let needs: ResultReview['needs'];
    if (r.level === 'blocked') needs = 'move-spot';
    else if (decision?.decision === 'accept') needs = 'nothing';
    else needs = r.level === 'needs-review' ? 'accept-with-reason' : 'confirm';
    return { ...r, decision, needs };
  });
  const blocked = reviewed.filter((r) => r.level === 'blocked');
  const sentBack = reviewed.filter((r) => r.decision?.decision === 'send-back');
  const pending = reviewed.filter((r) => r.needs === 'accept-with-reason' || r.needs === 'confirm');
  const base = { results: reviewed, pendingCount: pending.length, blockedCount: blocked.length, staleDecisionCount };

  if (spot.state === 'planned') {
    const reasons = blocked.map((r) => `Blocked: ${r.message} This spot cannot be raised; choose another.`);
    return { ...base, state: 'planned', reasons };
  }
  if (blocked.length > 0) {
    return {
      ...base,
      state: 'sent-back',
      reasons: blocked.map((r) => `Blocked: ${r.message} No one can accept a blocked result; the spot must move.`),
    };
  }
  if (sentBack.length > 0) {
    return { ...base, state: 'sent-back', reasons: sentBack.map((r) => `Sent back: ${r.decision!.reason}`) };
  }
  const changed = spot.inputsFingerprint ? fingerprintChanges(spot.inputsFingerprint, currentFingerprint, inputs.supportLabels) : [];
  if (pending.length === 0 && reviewed.length > 0) {
    if ((spot.state === 'up' || spot.state === 'down') && changed.length === 0) return { ...base, state: spot.state, reasons: [] };
    return { ...base, state: 'cleared', reasons: [] };
  }
  const wasCleared = spot.state === 'cleared' || spot.state === 'up' || spot.state === 'down';
  const reasons = wasCleared || staleDecisionCount > 0 ? changed : [];
  if (reviewed.length === 0) reasons.push('No clearance results could be computed for this spot yet, so it cannot be cleared.');
  return { ...base, state: 'waiting-review', reasons };
}

export type DecisionDraft = Pick<ReviewDecision, 'resultKey' | 'decision' | 'reason' | 'inputsFingerprint'>;

/**
 * Whether a decision may be recorded; the reason in plain words when not. The app checks before writing,
 * and the server checks again when the decision arrives.
 */
export function decisionProblem(draft: DecisionDraft, results: readonly ReviewResult[], currentFingerprint: string): string | null {
  const result = results.find((r) => r.key === draft.resultKey);
  if (!result) return 'This clearance result is no longer on the spot; look at the spot again.';
  if (draft.inputsFingerprint !== currentFingerprint) {
    return 'The spot, its supports, the hazards or the ground changed since you opened it; look at it again before deciding.';
  }
  if (draft.decision === 'accept' && result.level === 'blocked') {
    return 'A blocked result cannot be accepted by anyone: the spot must move.';
  }
  if (draft.reason.trim().length < 3) return 'Write the reason for the decision.';
  return null;
}
