import type { HazardKind } from './forms/hazard-form-logic';
import type { SupportKind } from './forms/support-form-logic';
import type { FeatureRef } from './plan/plan-features';

/** What the side (wide) or lower (phone) panel of the survey shows. */
export type SurveyPanel =
  | { type: 'list' }
  | { type: 'detail'; ref: FeatureRef }
  | { type: 'edit'; ref: FeatureRef }
  | { type: 'add-support'; kind: SupportKind }
  | { type: 'add-hazard'; kind: HazardKind }
  | { type: 'add-position' }
  | { type: 'ground' }
  | { type: 'notes' };
