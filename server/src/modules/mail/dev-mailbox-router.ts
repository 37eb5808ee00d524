// GET /api/dev/mailbox (newest first; ?to=<e-mail> filters) and GET /api/dev/mailbox/:id — only while mail goes to
// the fake mailbox (MAIL_TRANSPORT=fake, the default); with SMTP both answer 404. A browser gets a small HTML page.
import { Router } from 'express';
import { z } from 'zod';
import type { AppDeps } from '../../app-deps';
import { AppError } from '../../http/errors';
import { escapeHtml } from './escape-html';
import { validate } from '../../http/validate';
import { FileMailbox } from './file-mailbox';
import type { StoredMail } from './mail-message';
import { mailboxDir } from './mail-settings';

const linkify = (s: string) => escapeHtml(s).replace(/https?:\/\/[^\s<]+/g, (url) => `<a href="${url}">${url}</a>`);

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title><style>body{font-family:sans-serif;max-width:48rem;margin:1rem auto;padding:0 1rem;color:#111;line-height:1.5}
li{margin:.5rem 0}pre{white-space:pre-wrap;background:#f3f3f3;padding:1rem;border-radius:6px}small{color:#333}</style></head>
<body><h1>${escapeHtml(title)}</h1>${body}</body></html>`;
}

function listPage(mails: StoredMail[], dir: string): string {
  const items = mails
    .map((m) => `<li><a href="/api/dev/mailbox/${m.id}">${escapeHtml(m.subject)}</a><br><small>to ${escapeHtml(m.to)} · ${escapeHtml(m.sentAt)}</small></li>`)
    .join('');
  const intro = `<p>Loftline's fake mailbox: every e-mail the server sends while no SMTP server is set. The messages are kept as JSON files in <code>${escapeHtml(dir)}</code>.</p>`;
  return page('Dev mailbox', `${intro}${mails.length ? `<ul>${items}</ul>` : '<p>No messages yet.</p>'}`);
}

function messagePage(m: StoredMail): string {
  return page(m.subject, `<p><small>to ${escapeHtml(m.to)} · from ${escapeHtml(m.from)} · ${escapeHtml(m.sentAt)}</small></p><pre>${linkify(m.text)}</pre><p><a href="/api/dev/mailbox">All messages</a></p>`);
}

export function devMailboxRouter(deps: AppDeps): Router {
  const router = Router();
  const fake = deps.config.mail.transport === 'fake';
  const mailbox = new FileMailbox(mailboxDir(deps.config.dataDir));
  router.use((_req, _res, next) => next(fake ? undefined : new AppError('not_found', 'not_found', 'the dev mailbox exists only with the fake mail transport')));

  router.get('/', validate({ query: z.strictObject({ to: z.string().max(254).optional() }) }), async (req, res) => {
    const mails = await mailbox.list({ to: (req.query as { to?: string }).to });
    res.format({
      json: () => res.json(mails),
      html: () => res.type('html').send(listPage(mails, mailbox.dir)),
    });
  });
  router.get('/:id', async (req, res) => {
    const mail = await mailbox.get(String(req.params.id));
    if (!mail) throw new AppError('not_found', 'not_found', 'no such message in the dev mailbox');
    res.format({
      json: () => res.json(mail),
      html: () => res.type('html').send(messagePage(mail)),
    });
  });
  return router;
}
