// The review e-mails: one per person per push, listing every spot that concerns them, each with its link.
import { CAUTION_LINES } from '../../../../shared/clearance/cautions';
import type { NotificationKind } from '../../../../shared/schemas';
import { escapeHtml } from '../mail/escape-html';
import type { MailMessage } from '../mail/mail-message';
import type { SpotSummary } from './notification-repository';

/** `noCrewNamed`: a "sheet ready" that reached every crew member because the spot's station names no crew. */
export type NoticeItem = { kind: NotificationKind; spot: SpotSummary; noCrewNamed?: boolean };

export const NO_CREW_NAMED_LINE = 'No crew is named for this station, so every crew member gets this.';

const SHAPE_WORDS: Record<string, string> = { flat: 'flat-top dipole', 'inverted-v': 'inverted-V dipole' };

export function spotLink(appUrl: string, kind: NotificationKind, spot: SpotSummary): string {
  const base = `${appUrl.replace(/\/+$/, '')}/events/${encodeURIComponent(spot.eventId)}`;
  if (kind === 'reviewWaiting') return `${base}/review`;
  if (kind === 'sheetReady') return `${base}/sheets/${encodeURIComponent(spot.spotId)}`;
  return `${base}/plan`;
}

const describe = (s: SpotSummary) => `${s.band} ${SHAPE_WORDS[s.shape] ?? 'dipole'} for ${s.stationName} (${s.eventName})`;

const SECTION: Record<NotificationKind, { one: string; many: (n: number) => string; after: string }> = {
  reviewWaiting: {
    one: 'An antenna spot is waiting for your safety review:',
    many: (n) => `${n} antenna spots are waiting for your safety review:`,
    after: 'Open the review to check each clearance and accept it with a reason, or send the spot back.',
  },
  spotSentBack: {
    one: 'The safety review sent an antenna spot back:',
    many: (n) => `The safety review sent ${n} antenna spots back:`,
    after: 'Open the plan to read the reasons and move or change the spot.',
  },
  spotCleared: {
    one: 'An antenna spot has passed the safety review and is cleared to raise:',
    many: (n) => `${n} antenna spots have passed the safety review and are cleared to raise:`,
    after: 'Their crew sheets are ready for the day.',
  },
  sheetReady: {
    one: 'Your antenna sheet is ready:',
    many: (n) => `${n} antenna sheets are ready:`,
    after: 'Open a sheet before you head out: it works offline once opened.',
  },
};

function subjectOf(items: readonly NoticeItem[]): string {
  const kinds = [...new Set(items.map((i) => i.kind))];
  const events = [...new Set(items.map((i) => i.spot.eventName))];
  const where = events.length === 1 ? ` · ${events[0]}` : '';
  const n = items.length;
  // A lead named as a station's crew hears "cleared" and "sheet ready" of the same spot: count the spots once.
  const spotCount = new Set(items.map((i) => i.spot.spotId)).size;
  if (kinds.length > 1) return spotCount === 1 ? `Safety review news on an antenna spot${where}` : `Safety review news on ${spotCount} antenna spots${where}`;
  const plural = n > 1;
  switch (kinds[0]) {
    case 'reviewWaiting':
      return `${plural ? `${n} antenna spots are` : 'An antenna spot is'} waiting for your review${where}`;
    case 'spotSentBack':
      return `${plural ? `${n} antenna spots were` : 'An antenna spot was'} sent back${where}`;
    case 'spotCleared':
      return `${plural ? `${n} antenna spots are` : 'An antenna spot is'} cleared to raise${where}`;
    default:
      return `${plural ? `${n} antenna sheets are` : 'Your antenna sheet is'} ready${where}`;
  }
}

/** One e-mail to one person. `items` is non-empty; the caller orders them. */
export function noticeMail(input: { to: string; displayName: string; appUrl: string; items: readonly NoticeItem[] }): MailMessage {
  const sections = (Object.keys(SECTION) as NotificationKind[])
    .map((kind) => ({ kind, items: input.items.filter((i) => i.kind === kind) }))
    .filter((s) => s.items.length > 0);
  const needsCaution = sections.some((s) => s.kind === 'spotCleared' || s.kind === 'sheetReady');
  const footer = 'You can turn these e-mails off in Loftline under Settings → Notifications.';

  const text: string[] = [`Hello ${input.displayName},`];
  const html: string[] = [`<p>Hello ${escapeHtml(input.displayName)},</p>`];
  for (const s of sections) {
    const words = SECTION[s.kind];
    const lead = s.items.length === 1 ? words.one : words.many(s.items.length);
    const note = (i: NoticeItem) => (i.noCrewNamed ? `\n  ${NO_CREW_NAMED_LINE}` : '');
    text.push([lead, ...s.items.map((i) => `- ${describe(i.spot)}\n  ${spotLink(input.appUrl, s.kind, i.spot)}${note(i)}`), words.after].join('\n'));
    const lis = s.items
      .map((i) => {
        const href = escapeHtml(spotLink(input.appUrl, s.kind, i.spot));
        const noteHtml = i.noCrewNamed ? `<br><em>${escapeHtml(NO_CREW_NAMED_LINE)}</em>` : '';
        return `<li>${escapeHtml(describe(i.spot))}<br><a href="${href}" style="color: #14532d">${href}</a>${noteHtml}</li>`;
      })
      .join('\n');
    html.push(`<p>${escapeHtml(lead)}</p>\n<ul>\n${lis}\n</ul>\n<p>${escapeHtml(words.after)}</p>`);
  }
  if (needsCaution) {
    text.push(`Cleared means every clearance on the spot was accepted in the review. ${CAUTION_LINES.join(' ')}`);
    html.push(`<p style="color: #7c2d12"><strong>Cleared means every clearance on the spot was accepted in the review.</strong> ${escapeHtml(CAUTION_LINES.join(' '))}</p>`);
  }
  text.push(footer);
  html.push(`<p style="color: #333">${escapeHtml(footer)}</p>`);
  return {
    to: input.to,
    subject: subjectOf(input.items),
    text: `${text.join('\n\n')}\n\n73,\nLoftline\n`,
    html: `<!doctype html><html><body style="font-family: sans-serif; font-size: 16px; line-height: 1.5; color: #111">\n${html.join('\n')}\n<p>73,<br>Loftline</p>\n</body></html>`,
  };
}
