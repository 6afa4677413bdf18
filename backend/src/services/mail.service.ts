import nodemailer from 'nodemailer';

import type { Env } from '../config/env';

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
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: env.MAIL_FROM, to: mail.to, subject: mail.subject, text: mail.text });
    },
    close: () => transport.close(),
  };
}
