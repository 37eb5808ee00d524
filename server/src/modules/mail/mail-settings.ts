import path from 'node:path';
import type { Config } from '../../config';

/*
 * Where mail goes, from the server configuration (SMTP_* variables, read and validated in config.ts).
 * With the fake transport (the default) every message lands in ${DATA_DIR}/mailbox/, one JSON file per
 * message, readable at /api/dev/mailbox; with SMTP the worker hands messages to that server and the dev
 * mailbox routes answer 404.
 */

export type SmtpSettings = {
  host: string;
  port: number;
  /** TLS from the first byte (port 465). When false nodemailer still upgrades with STARTTLS if the server offers it. */
  secure: boolean;
  auth: { user: string; pass: string } | null;
};

export type MailSettings =
  | { transport: 'fake'; from: string; mailboxDir: string }
  | { transport: 'smtp'; from: string; smtp: SmtpSettings };

export function mailboxDir(dataDir: string): string {
  return path.join(dataDir, 'mailbox');
}

type MailConfig = Config['mail'];

export function mailSettingsFromConfig(config: { dataDir: string; mail: MailConfig }): MailSettings {
  const { mail } = config;
  if (mail.transport === 'fake' || !mail.smtp) return { transport: 'fake', from: mail.from, mailboxDir: mailboxDir(config.dataDir) };
  const { host, port, user, pass } = mail.smtp;
  return {
    transport: 'smtp',
    from: mail.from,
    smtp: { host, port, secure: mail.smtp.secure ?? port === 465, auth: user ? { user, pass: pass ?? '' } : null },
  };
}
