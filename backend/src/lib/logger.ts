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

/** One-time links carry their token in the path; a logged path keeps the route, not the token. */
const TOKEN_IN_PATH = /(\/(?:api\/auth\/tokens|set-password)\/)[^/?#]+/g;

export const scrubPath = (path: string) => path.replace(TOKEN_IN_PATH, '$1[redacted]');

/** Lines are JSON with an ISO 8601 UTC time ("time":"2026-12-02T08:15:00.000Z"). */
export function createLogger(level: string, destination?: NodeJS.WritableStream): Logger {
  return pino(
    {
      level,
      redact: { paths: REDACTED_PATHS, censor: '[redacted]' },
      formatters: {
        log: (object) => (typeof object.path === 'string' ? { ...object, path: scrubPath(object.path) } : object),
      },
      timestamp: pino.stdTimeFunctions.isoTime,
      base: { service: 'tracewright' },
    },
    destination as pino.DestinationStream | undefined,
  );
}
