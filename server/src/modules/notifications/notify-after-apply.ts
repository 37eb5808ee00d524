// The sync hook: after a push is applied, announce the spots that entered review, were sent back or were cleared.
// Runs inside the push's transaction, so the once-only keys and the queued e-mails (pg-boss, same transaction)
// commit together with the changes: a push that rolls back mails nothing, and a re-pushed change finds its key taken.
import type { NotificationKind } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { enqueueMail } from '../mail/mail-service';
import type { AfterApplyHook, AppliedPush } from '../sync/after-apply';
import { eventKey, spotEventsOf, type SpotEvent } from './notification-events';
import { noticeMail, type NoticeItem } from './notification-mail';
import { spotsClearedByDecisions } from '../review/cleared-by-decisions';
import { claimEventKeys, namedCrewOf, recipientsOf, spotSummaries, type Recipient } from './notification-repository';

/** Who hears of a spot event, by notification kind: a cleared spot tells the lead and readies the crews' sheets. */
const KINDS_OF_EVENT: Record<SpotEvent['kind'], NotificationKind[]> = {
  reviewWaiting: ['reviewWaiting'],
  spotSentBack: ['spotSentBack'],
  spotCleared: ['spotCleared', 'sheetReady'],
};

export function notificationsAfterApply(deps: Pick<AppDeps, 'config' | 'mail' | 'logger'>): AfterApplyHook {
  return {
    name: 'notifications',
    async run(em, push: AppliedPush) {
      const candidates = spotEventsOf(push.changes);
      // Accepting the last open result clears a spot without its stored state changing: derived on the server.
      for (const spotId of await spotsClearedByDecisions(em, push)) {
        if (!candidates.some((c) => c.spotId === spotId && c.kind === 'spotCleared')) candidates.push({ kind: 'spotCleared', spotId });
      }
      if (candidates.length === 0) return;
      const spots = await spotSummaries(em, push.clubId, [...new Set(candidates.map((e) => e.spotId))]);
      const live = candidates.filter((e) => spots.has(e.spotId));
      const claimed = await claimEventKeys(em, push.clubId, live.map((e) => eventKey(e, push.nowMs)));
      const fresh = live.filter((e) => claimed.has(eventKey(e, push.nowMs)));
      if (fresh.length === 0) return;

      // Batch: every notice of this push for one person goes into one e-mail.
      const byPerson = new Map<string, { who: Recipient; items: NoticeItem[] }>();
      const audience = new Map<NotificationKind, Recipient[]>();
      // Spots of one station share its crew: look each crew list up once per push.
      const crewAudience = new Map<string, Awaited<ReturnType<typeof namedCrewOf>>>();
      const crewOf = async (ids: string[]) => {
        const key = [...ids].sort().join(',');
        if (!crewAudience.has(key)) crewAudience.set(key, await namedCrewOf(em, push.clubId, ids));
        return crewAudience.get(key)!;
      };
      const roleAudience = async (kind: NotificationKind) => {
        if (!audience.has(kind)) audience.set(kind, await recipientsOf(em, push.clubId, kind));
        return audience.get(kind)!;
      };
      for (const e of fresh) {
        const spot = spots.get(e.spotId)!;
        for (const kind of KINDS_OF_EVENT[e.kind]) {
          let who: Recipient[];
          let noCrewNamed = false;
          if (kind === 'sheetReady') {
            // The station's own crew; a station that names no one (still a member) readies every crew member.
            const crew = await crewOf(spot.crewMemberIds);
            noCrewNamed = !crew.named;
            who = crew.named ? crew.recipients : await roleAudience(kind);
          } else who = await roleAudience(kind);
          for (const person of who) {
            const entry = byPerson.get(person.userId) ?? { who: person, items: [] };
            entry.items.push({ kind, spot, ...(noCrewNamed ? { noCrewNamed } : {}) });
            byPerson.set(person.userId, entry);
          }
        }
      }
      for (const { who, items } of byPerson.values()) {
        items.sort((a, b) => a.spot.eventName.localeCompare(b.spot.eventName) || a.spot.band.localeCompare(b.spot.band) || a.spot.spotId.localeCompare(b.spot.spotId));
        await enqueueMail(deps, noticeMail({ to: who.email, displayName: who.displayName, appUrl: deps.config.appUrl, items }), { manager: em });
      }
      deps.logger.info({ clubId: push.clubId, events: fresh.length, recipients: byPerson.size }, 'notifications queued');
    },
  };
}
