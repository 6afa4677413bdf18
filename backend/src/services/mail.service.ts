import nodemailer from 'nodemailer';

import type { Env } from '../config/env';
import { AppError } from '../errors/app-error';

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/** Nodemailer over SMTP: the local fake in development and tests, the lab's server in production. */
export function createMailer(env: Env): Mailer {
  const transport = nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    // The fake speaks plain SMTP on loopback; a real server negotiates TLS as usual.
    ignoreTLS: env.MAIL_CAPTURE_DIR !== undefined,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? '' } : undefined,
    // A request waiting on mail must not hang for minutes when the mail server is away.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return {
    async send(mail) {
      try {
        await transport.sendMail({ from: env.MAIL_FROM, to: mail.to, subject: mail.subject, text: mail.text });
      } catch {
        // Mail goes out after the change is committed, so the change itself is safe: say so.
        throw new AppError(
          503,
          'SERVICE_UNAVAILABLE',
          'The change was saved, but the mail server did not accept the message. Try sending it again in a few minutes.',
        );
      }
    },
    close: () => transport.close(),
  };
}
