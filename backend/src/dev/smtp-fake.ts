import { randomBytes } from 'node:crypto';
import type { AddressInfo } from 'node:net';

import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

import type { CapturedMail } from '@tracewright/shared';

import { saveCapturedMail } from './captured-mail';

export interface SmtpFake {
  port: number;
  mails: CapturedMail[];
  /** Resolves with the first mail (already caught or still to come) that matches. */
  waitFor(match: (mail: CapturedMail) => boolean, timeoutMs?: number): Promise<CapturedMail>;
  close(): Promise<void>;
}

/** A local SMTP server on loopback that keeps every mail (in memory and, if given, as files). */
export async function startSmtpFake(options: { port?: number; captureDir?: string } = {}): Promise<SmtpFake> {
  const mails: CapturedMail[] = [];
  const waiters: Array<{ match: (m: CapturedMail) => boolean; resolve: (m: CapturedMail) => void }> = [];
  let sequence = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const to = (Array.isArray(parsed.to) ? parsed.to : parsed.to ? [parsed.to] : []).flatMap((a) =>
            a.value.map((v) => v.address ?? ''),
          );
          const receivedAt = new Date();
          sequence += 1;
          const mail: CapturedMail = {
            id: `${receivedAt.toISOString().replace(/[:.]/g, '-')}-${String(sequence).padStart(4, '0')}-${randomBytes(3).toString('hex')}`,
            receivedAt: receivedAt.toISOString(),
            from: parsed.from?.text ?? '',
            to,
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
          };
          mails.push(mail);
          if (options.captureDir) await saveCapturedMail(options.captureDir, mail);
          for (const waiter of waiters.filter((w) => w.match(mail))) {
            waiters.splice(waiters.indexOf(waiter), 1);
            waiter.resolve(mail);
          }
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve());
  });
  const { port } = server.server.address() as AddressInfo;
  return {
    port,
    mails,
    waitFor(match, timeoutMs = 5_000) {
      const found = mails.find(match);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => reject(new Error('No matching mail arrived in time.')), timeoutMs);
        waiters.push({ match, resolve: (m) => (clearTimeout(timer), resolve(m)) });
      });
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
