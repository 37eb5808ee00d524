import nodemailer from 'nodemailer';
import type { Transport } from 'nodemailer';
import type { FileMailbox } from './file-mailbox';
import type { MailMessage } from './mail-message';
import type { MailSettings } from './mail-settings';

type FileTransportInfo = { messageId: string; envelope: { from: string; to: string[] } };

/** A nodemailer transport that keeps each message in the fake mailbox instead of sending it. */
export function fileMailboxTransport(mailbox: FileMailbox, now: () => Date): Transport<FileTransportInfo> {
  return {
    name: 'loftline-file-mailbox',
    version: '1',
    send(mail, callback) {
      const data = mail.data;
      const text = (v: unknown) => (typeof v === 'string' ? v : Buffer.isBuffer(v) ? v.toString('utf8') : '');
      const address = (v: unknown): string => {
        if (typeof v === 'string') return v;
        if (Array.isArray(v)) return v.map(address).join(', ');
        if (v && typeof v === 'object' && 'address' in v) return String((v as { address: string }).address);
        return '';
      };
      mailbox
        .save({ to: address(data.to), from: address(data.from), subject: text(data.subject), text: text(data.text), html: data.html ? text(data.html) : null }, now())
        .then((stored) => callback(null, { messageId: `<${stored.id}@mailbox.loftline>`, envelope: { from: address(data.from), to: [stored.to] } }))
        .catch((err: Error) => callback(err, undefined as never));
    },
  };
}

/** Sends one message now, by whichever transport the settings name. The queue worker is its only caller. */
export interface Mailer {
  send(message: MailMessage): Promise<void>;
  close(): void;
}

export function createMailer(settings: MailSettings, mailbox: FileMailbox | null, now: () => Date): Mailer {
  const transporter =
    settings.transport === 'smtp'
      ? nodemailer.createTransport({
          host: settings.smtp.host,
          port: settings.smtp.port,
          secure: settings.smtp.secure,
          auth: settings.smtp.auth ?? undefined,
          // Fail fast while the server is down: the queue retries with backoff, so a hung socket only delays others.
          connectionTimeout: 10_000,
          greetingTimeout: 10_000,
          socketTimeout: 30_000,
        })
      : nodemailer.createTransport(fileMailboxTransport(requireMailbox(mailbox), now));
  return {
    async send(message) {
      await transporter.sendMail({ from: settings.from, to: message.to, subject: message.subject, text: message.text, html: message.html });
    },
    close() {
      transporter.close();
    },
  };
}

function requireMailbox(mailbox: FileMailbox | null): FileMailbox {
  if (!mailbox) throw new Error('the fake mail transport needs a mailbox folder');
  return mailbox;
}
