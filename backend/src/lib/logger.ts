import { pino, type Logger } from 'pino';

/** Paths pino removes from every log line: secrets must never reach the logs. */
export const REDACTED_PATHS = [
  'req.headers.cookie',
  'req.headers.authorization',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  '*.password',
  '*.pin',
  '*.token',
  '*.passwordHash',
  '*.pinHash',
];

export function createLogger(level: string, destination?: NodeJS.WritableStream): Logger {
  return pino(
    {
      level,
      redact: { paths: REDACTED_PATHS, censor: '[redacted]' },
      timestamp: pino.stdTimeFunctions.isoTime,
      base: { service: 'tracewright' },
    },
    destination as pino.DestinationStream | undefined,
  );
}
