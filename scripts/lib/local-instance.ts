import { join } from 'node:path';

import { startS3Fake } from '../../backend/src/dev/s3-fake';
import { startMariadb } from './mariadb';
import { DATA_DIR } from './paths';
import type { BackupTarget } from './backup';

/**
 * The `npm start` instance for backup and restore: its database (started for the moment if it
 * is not running) and its files through an S3 fake over the same folder, unless S3_ENDPOINT is set.
 */
export async function openLocalInstance(): Promise<{ target: BackupTarget; close(): Promise<void> }> {
  const db = await startMariadb({ baseDir: join(DATA_DIR, 'mariadb'), port: Number(process.env.DB_PORT ?? 3307), reuseRunning: true });
  const fake = process.env.S3_ENDPOINT ? undefined : await startS3Fake({ directory: join(DATA_DIR, 's3') });
  return {
    target: {
      socket: db.socket,
      database: process.env.DB_NAME ?? 'tracewright',
      s3: { endpoint: process.env.S3_ENDPOINT ?? fake?.endpoint ?? '', bucket: process.env.S3_BUCKET ?? 'tracewright-files' },
    },
    async close() {
      await fake?.close();
      await db.stop();
    },
  };
}
