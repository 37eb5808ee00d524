import { Badge } from '@/components/ui';
import { CLEARANCE_LOOK, SPOT_STATE_LOOK } from '@/constants/states';
import type { ClearanceLevel } from '@/shared/clearance/types';
import type { SpotState } from '@/shared/schemas';

/** A spot's state, the same word, colour and icon on every screen. */
export function SpotStateBadge({ state, testID }: { state: SpotState; testID?: string }) {
  return <Badge look={SPOT_STATE_LOOK[state]} testID={testID} />;
}

export function ClearanceBadge({ level, testID }: { level: ClearanceLevel; testID?: string }) {
  return <Badge look={CLEARANCE_LOOK[level]} testID={testID} />;
}
