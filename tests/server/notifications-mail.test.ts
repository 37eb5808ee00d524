// The wording of the review e-mails (pure; no database): links per kind as the brief gives them, one section per
// kind, names from the records escaped in the HTML part, the cautions only where a spot is cleared.
import { describe, expect, it } from 'vitest';
import { CAUTION_LINES } from '../../shared/clearance/cautions';
import { NO_CREW_NAMED_LINE, noticeMail, spotLink } from '../../server/src/modules/notifications/notification-mail';
import type { SpotSummary } from '../../server/src/modules/notifications/notification-repository';

const spot = (over: Partial<SpotSummary> = {}): SpotSummary => ({
  spotId: '11111111-1111-4111-8111-111111111111',
  eventId: '22222222-2222-4222-8222-222222222222',
  eventName: 'Midwinter Field Outing',
  band: '40m',
  shape: 'inverted-v',
  stationName: 'CW station',
  crewMemberIds: [],
  ...over,
});
const APP = 'https://loftline.kestrel.test/';

describe('review e-mail wording', () => {
  it('links: review queue for the safety officer, plan for the lead, the one sheet for a crew (issue 7 brief)', () => {
    const s = spot();
    expect(spotLink(APP, 'reviewWaiting', s)).toBe(`https://loftline.kestrel.test/events/${s.eventId}/review`);
    expect(spotLink(APP, 'spotSentBack', s)).toBe(`https://loftline.kestrel.test/events/${s.eventId}/plan`);
    expect(spotLink(APP, 'spotCleared', s)).toBe(`https://loftline.kestrel.test/events/${s.eventId}/plan`);
    expect(spotLink(APP, 'sheetReady', s)).toBe(`https://loftline.kestrel.test/events/${s.eventId}/sheets/${s.spotId}`);
  });

  it('names from the records are escaped in the HTML part and kept as written in the text part', () => {
    const m = noticeMail({ to: 'safety@kestrel.test', displayName: 'Sam <b>', appUrl: APP, items: [{ kind: 'reviewWaiting', spot: spot({ stationName: '<script>x</script> & co' }) }] });
    expect(m.html).not.toContain('<script>');
    expect(m.html).toContain('&lt;script&gt;x&lt;/script&gt; &amp; co');
    expect(m.html).toContain('Hello Sam &lt;b&gt;,');
    expect(m.text).toContain('40m inverted-V dipole for <script>x</script> & co (Midwinter Field Outing)');
    expect(m.subject).toBe('An antenna spot is waiting for your review · Midwinter Field Outing');
  });

  it('the cautions (shared/clearance/cautions.ts) ride with cleared spots and sheets, not with a review request', () => {
    const review = noticeMail({ to: 'a@kestrel.test', displayName: 'A', appUrl: APP, items: [{ kind: 'reviewWaiting', spot: spot() }] });
    const sheet = noticeMail({ to: 'c@kestrel.test', displayName: 'C', appUrl: APP, items: [{ kind: 'sheetReady', spot: spot() }] });
    for (const line of CAUTION_LINES) {
      expect(sheet.text).toContain(line);
      expect(review.text).not.toContain(line);
    }
  });

  it('spots of two events: one e-mail, the subject names no single event, each spot keeps its own link', () => {
    const a = spot();
    const b = spot({ spotId: '33333333-3333-4333-8333-333333333333', eventId: '44444444-4444-4444-8444-444444444444', eventName: 'Spring Outing', band: '20m', shape: 'flat' });
    const m = noticeMail({ to: 'c@kestrel.test', displayName: 'C', appUrl: APP, items: [{ kind: 'sheetReady', spot: a }, { kind: 'sheetReady', spot: b }] });
    expect(m.subject).toBe('2 antenna sheets are ready');
    expect(m.text).toContain(`/events/${a.eventId}/sheets/${a.spotId}`);
    expect(m.text).toContain(`/events/${b.eventId}/sheets/${b.spotId}`);
    expect(m.text).toContain('20m flat-top dipole for CW station (Spring Outing)');
  });

  it('a sheet that went to every crew member says why (no crew named for the station); a named crew’s sheet does not', () => {
    const all = noticeMail({ to: 'c@kestrel.test', displayName: 'C', appUrl: APP, items: [{ kind: 'sheetReady', spot: spot(), noCrewNamed: true }] });
    expect(all.text).toContain('No crew is named for this station, so every crew member gets this.');
    expect(all.html).toContain(`<em>${NO_CREW_NAMED_LINE}</em>`);
    const own = noticeMail({ to: 'c@kestrel.test', displayName: 'C', appUrl: APP, items: [{ kind: 'sheetReady', spot: spot({ crewMemberIds: ['33333333-3333-4333-8333-333333333333'] }) }] });
    expect(own.text).not.toContain('No crew is named');
    expect(own.html).not.toContain('No crew is named');
  });

  it('a lead named as crew hears "cleared" and "sheet ready" of one spot in one e-mail whose subject counts the spot once', () => {
    const s = spot();
    const m = noticeMail({ to: 'l@kestrel.test', displayName: 'L', appUrl: APP, items: [{ kind: 'spotCleared', spot: s }, { kind: 'sheetReady', spot: s }] });
    expect(m.subject).toBe('Safety review news on an antenna spot · Midwinter Field Outing');
    expect(m.text).toContain(`/events/${s.eventId}/plan`);
    expect(m.text).toContain(`/events/${s.eventId}/sheets/${s.spotId}`);
  });
});
