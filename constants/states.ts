import type { SpotState } from '@/shared/schemas';
import { colors } from './theme';
import type { IconName } from './icons';

/*
 * How states look, everywhere in the app. Colour is never the only signal: each state has a word and an
 * icon of its own shape, so a colour-blind crew member or a screen washed out by the sun still reads it.
 */

export type StateLook = { label: string; icon: IconName; fg: string; bg: string; border: string; hint: string };

export const SPOT_STATE_LOOK: Record<SpotState, StateLook> = {
  planned: { label: 'Planned', icon: 'pencil', fg: colors.ink, bg: colors.surfaceSunk, border: colors.line, hint: 'Drawn by the lead; not yet sent for review.' },
  'waiting-review': { label: 'Waiting for review', icon: 'hourglass', fg: colors.warning, bg: colors.warningSoft, border: colors.warning, hint: 'The safety officer has to look at its clearances.' },
  'sent-back': { label: 'Sent back', icon: 'return', fg: colors.danger, bg: colors.dangerSoft, border: colors.danger, hint: 'The safety officer sent it back with a reason; the lead must change it.' },
  cleared: { label: 'Cleared to raise', icon: 'check-shield', fg: colors.ok, bg: colors.okSoft, border: colors.ok, hint: 'Reviewed; the crew may raise it as planned.' },
  up: { label: 'Up', icon: 'arrow-up', fg: colors.onAction, bg: colors.action, border: colors.action, hint: 'Raised and in use.' },
  down: { label: 'Down', icon: 'arrow-down', fg: colors.ink, bg: colors.surface, border: colors.line, hint: 'Lowered or taken down.' },
};

export const CLEARANCE_LEVELS = ['blocked', 'needs-review', 'clear'] as const;
export type ClearanceLevel = (typeof CLEARANCE_LEVELS)[number];

export const CLEARANCE_LOOK: Record<ClearanceLevel, StateLook> = {
  blocked: { label: 'Blocked', icon: 'octagon-x', fg: colors.danger, bg: colors.dangerSoft, border: colors.danger, hint: 'Something could fall onto a power line or into a public area: move it.' },
  'needs-review': { label: 'Needs review', icon: 'triangle-alert', fg: colors.warning, bg: colors.warningSoft, border: colors.warning, hint: 'Loftline could not check everything: a person has to look.' },
  // "Clear" means clear of what Loftline could check, never "safe": the cautions always travel with it.
  clear: { label: 'Clear of what was checked', icon: 'check-circle', fg: colors.ok, bg: colors.okSoft, border: colors.ok, hint: 'No conflict found in what the scouts recorded. Still a planning estimate.' },
};

export const SYNC_STATE_LOOK = {
  synced: { label: 'Synced', icon: 'cloud-check', fg: colors.ok, bg: colors.okSoft, border: colors.ok, hint: 'On the server.' },
  pending: { label: 'Waiting to sync', icon: 'cloud-up', fg: colors.warning, bg: colors.warningSoft, border: colors.warning, hint: 'Kept on this phone; it will sync when online.' },
  rejected: { label: 'Not accepted', icon: 'octagon-x', fg: colors.danger, bg: colors.dangerSoft, border: colors.danger, hint: 'The server refused this change; open it to see why.' },
} as const satisfies Record<string, StateLook>;
