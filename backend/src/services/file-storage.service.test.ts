import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { loadEnv } from '../config/env';
import { startS3Fake, type S3Fake } from '../dev/s3-fake';
import { createFileStorage } from './file-storage.service';

let fake: S3Fake;
let dir: string;
beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'tw-s3-'));
  fake = await startS3Fake({ directory: dir });
});
afterAll(async () => {
  await fake.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('file storage through the S3 SDK', () => {
  it('when a binary file is stored and read back, then every byte is the same', async () => {
    const storage = createFileStorage(
      loadEnv({ DB_PASSWORD: 'x', JWT_SECRET: 'x'.repeat(32), S3_ENDPOINT: fake.endpoint, S3_BUCKET: 'round-trip' }),
    );
    await storage.ensureBucket();
    const body = randomBytes(300_000);
    await storage.put('artwork/abc.png', body, 'image/png');
    const back = await storage.get('artwork/abc.png');
    expect(back.equals(body)).toBe(true);
  });
});
