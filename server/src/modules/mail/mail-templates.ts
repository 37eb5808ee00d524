import { ROLE_LABELS, type Role } from '../../../../shared/schemas';
import { escapeHtml } from './escape-html';
import type { MailMessage } from './mail-message';

/* The e-mails Loftline sends, in plain, friendly words. Each has a text part and a simple HTML part with the same link. */


function trimSlash(url: string): string {
  return url.replace(/\/+$/, '');
}

const WEEKDAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];
const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
const two = (n: number) => String(n).padStart(2, '0');

/** "Tuesday 8 December 2026, 21:30 UTC": stated in UTC so nobody guesses the zone; built by hand, not by the ICU locale data. */
export function formatExpiryUtc(at: Date): string {
  return `${WEEKDAYS[at.getUTCDay()]} ${at.getUTCDate()} ${MONTHS[at.getUTCMonth()]} ${at.getUTCFullYear()}, ${two(at.getUTCHours())}:${two(at.getUTCMinutes())} UTC`;
}

function html(paragraphs: string[], link: { href: string; label: string }): string {
  const ps = paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n');
  return `<!doctype html><html><body style="font-family: sans-serif; font-size: 16px; line-height: 1.5; color: #111">
${ps}
<p><a href="${escapeHtml(link.href)}" style="display: inline-block; padding: 12px 20px; background: #14532d; color: #fff; text-decoration: none; border-radius: 6px">${escapeHtml(link.label)}</a></p>
<p style="color: #333">If the button does not work, copy this address into your browser:<br>${escapeHtml(link.href)}</p>
</body></html>`;
}

export function invitationLink(appUrl: string, token: string): string {
  return `${trimSlash(appUrl)}/invite/${encodeURIComponent(token)}`;
}

export function passwordResetLink(appUrl: string, token: string): string {
  return `${trimSlash(appUrl)}/reset-password?token=${encodeURIComponent(token)}`;
}

export function invitationMail(input: {
  to: string;
  appUrl: string;
  token: string;
  clubName: string;
  role: Role;
  invitedBy: string;
  expiresAt: Date;
}): MailMessage {
  const link = invitationLink(input.appUrl, input.token);
  const roleLabel = ROLE_LABELS[input.role].toLowerCase();
  const lines = [
    'Hello,',
    `${input.invitedBy} has invited you to join ${input.clubName} on Loftline as ${roleLabel === 'club admin' ? 'a club admin' : `a ${roleLabel}`}.`,
    'Loftline is where the club plans its field-day antennas: the scouts record the site, the lead plans the wires, the safety officer checks the clearances and the crews get their sheets.',
    `Open the link below to accept. If you are new to Loftline you can create your account in the same step. The link works once and expires on ${formatExpiryUtc(input.expiresAt)}.`,
    'If you were not expecting this, you can ignore this e-mail: nothing happens until the link is opened.',
  ];
  return {
    to: input.to,
    subject: `You're invited to ${input.clubName} on Loftline`,
    text: `${lines.join('\n\n')}\n\nAccept the invitation:\n${link}\n\n73,\nLoftline\n`,
    html: html(lines, { href: link, label: 'Accept the invitation' }),
  };
}

/** How long a link lasts, in words: "1 hour", "90 minutes". */
function lasting(minutes: number): string {
  if (minutes % 60 === 0) return minutes === 60 ? '1 hour' : `${minutes / 60} hours`;
  return `${minutes} minutes`;
}

export function passwordResetMail(input: { to: string; appUrl: string; token: string; name?: string; validMinutes?: number }): MailMessage {
  const link = passwordResetLink(input.appUrl, input.token);
  const lines = [
    input.name ? `Hello ${input.name},` : 'Hello,',
    'Someone asked to reset the password of your Loftline account. If it was you, open the link below and choose a new password.',
    `The link works once and expires in ${lasting(input.validMinutes ?? 60)}.`,
    'If you did not ask for this, ignore this e-mail: your password stays as it is.',
  ];
  return {
    to: input.to,
    subject: 'Reset your Loftline password',
    text: `${lines.join('\n\n')}\n\nChoose a new password:\n${link}\n\n73,\nLoftline\n`,
    html: html(lines, { href: link, label: 'Choose a new password' }),
  };
}
