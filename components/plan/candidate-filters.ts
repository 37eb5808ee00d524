import type { ClearanceLevel } from '@/shared/clearance/types';
import type { Candidate } from '@/shared/plan';

export type CandidateFilter = { supportId: string | 'any'; level: ClearanceLevel | 'any' };

/** The ranked candidates that pass the lead's filters, best first (the engine's order is kept). */
export function filterCandidates(list: readonly Candidate[], f: CandidateFilter): Candidate[] {
  return list.filter((c) => (f.supportId === 'any' || c.supportIds.includes(f.supportId)) && (f.level === 'any' || c.level === f.level));
}
