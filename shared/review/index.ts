/*
 * shared/review — the safety review of antenna spots: the records → site-file converter the planner reads,
 * the inputs fingerprint that sends a changed spot back to review, and the derived review state.
 */
export { siteFileFromRecords, PLANNING_KV_BY_CLASS, UNRECORDED_GROUND } from './records-to-site-file';
export type { SiteRecords, SiteFileBuild } from './records-to-site-file';
export { spotFingerprint, fingerprintChanges } from './fingerprint';
export type { FingerprintInputs } from './fingerprint';
export { reviewSpot, decisionProblem } from './review-status';
export type { ReviewResult, ResultReview, SpotReview, SpotReviewInputs, DecisionDraft } from './review-status';
export { evaluateEventSpots, reviewResultsOf } from './spot-evaluation';
export type { SpotEvaluation } from './spot-evaluation';
export { spotSeparations } from './spot-separations';
