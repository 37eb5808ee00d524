// Which review events a push carries, read from the rows it changed (before → after). Pure: the database work is
// in the repository. A spot "enters" a state when its stored state changes to it (or it is created in it); a
// send-back decision announces its spot as sent back even before the spot's own state is rewritten.
import type { NotificationKind } from '../../../../shared/schemas';
import type { AppliedChange } from '../sync/after-apply';

/** What happened to one spot: the three review events; "sheet ready" goes out with "cleared". */
export type SpotEventKind = Extract<NotificationKind, 'reviewWaiting' | 'spotSentBack' | 'spotCleared'>;
export type SpotEvent = { kind: SpotEventKind; spotId: string };

const KIND_OF_STATE: Record<string, SpotEventKind | undefined> = {
  'waiting-review': 'reviewWaiting',
  'sent-back': 'spotSentBack',
  cleared: 'spotCleared',
};

/**
 * Events of the same spot and kind inside one bucket are one event: a spot bounced between states by two devices,
 * or the same change pushed again, mails once. A spot that really enters the state again later mails again.
 */
export const EVENT_BUCKET_MS = 10 * 60_000;

export function spotEventsOf(changes: readonly AppliedChange[]): SpotEvent[] {
  const out = new Map<string, SpotEvent>();
  const add = (e: SpotEvent) => out.set(`${e.spotId}:${e.kind}`, e);
  for (const { before, after } of changes) {
    if (after.deletedAt !== null) continue;
    if (after.collection === 'antennaSpots') {
      const kind = KIND_OF_STATE[String(after.fields.state)];
      const wasLive = before !== null && before.deletedAt === null;
      if (kind && (!wasLive || before.fields.state !== after.fields.state)) add({ kind, spotId: after.id });
    } else if (after.collection === 'reviewDecisions' && before === null && after.fields.decision === 'send-back') {
      add({ kind: 'spotSentBack', spotId: String(after.fields.spotId) });
    }
  }
  return [...out.values()];
}

/** The once-only key of an event: spot + kind + time bucket. */
export function eventKey(e: SpotEvent, nowMs: number): string {
  return `${e.spotId}:${e.kind}:${Math.floor(nowMs / EVENT_BUCKET_MS)}`;
}
