import { baseUrl } from './session';

type Mail = { id: string; to: string; subject: string; text: string; sentAt: string };

/**
 * Wait for a message to `to` in the fake mailbox (GET /api/dev/mailbox?to=…). Mail goes through the
 * pg-boss queue and its worker, so it arrives a moment after the request that sent it.
 */
export async function waitForMail(to: string, subjectMatch: RegExp, timeoutMs = 30_000): Promise<Mail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const res = await fetch(`${baseUrl()}/api/dev/mailbox?to=${encodeURIComponent(to)}`, { headers: { accept: 'application/json' } });
    if (res.ok) {
      const mails = (await res.json()) as Mail[];
      const hit = mails.find((m) => subjectMatch.test(m.subject));
      if (hit) return hit;
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`no mail to ${to} matching ${subjectMatch} within ${timeoutMs} ms`);
}

/** The first link in a mail's text that points into the app at `pathStart` ("/invite/", "/reset-password"). */
export function linkIn(mail: Mail, pathStart: string): string {
  const links = mail.text.match(/https?:\/\/[^\s]+/g) ?? [];
  const link = links.find((l) => new URL(l).pathname.startsWith(pathStart));
  if (!link) throw new Error(`no ${pathStart} link in mail "${mail.subject}": ${mail.text}`);
  return link;
}
