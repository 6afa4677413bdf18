import { execFileSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import { S3Client, GetObjectCommand } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';

import { backupTo, restoreFrom } from '../../scripts/lib/backup';
import { loadEnv } from '../src/config/env';
import { RecipeVersionModel } from '../src/models/recipe-version.model';
import { RecipeModel } from '../src/models/recipe.model';
import { startS3Fake, type S3Fake } from '../src/dev/s3-fake';
import { createFileStorage } from '../src/services/file-storage.service';
import { createUser } from './fixtures';
import { createTestContext, type TestContext } from './test-context';

let t: TestContext;
let s3: S3Fake;
let s3Dir: string;
let folder: string;
beforeAll(async () => {
  t = await createTestContext();
  s3Dir = mkdtempSync(join(tmpdir(), 'tw-s3-'));
  folder = mkdtempSync(join(tmpdir(), 'tw-backup-'));
  s3 = await startS3Fake({ directory: s3Dir });
});
afterAll(async () => {
  await t.close();
  await s3.close();
  rmSync(s3Dir, { recursive: true, force: true });
  rmSync(folder, { recursive: true, force: true });
});

describe('backup and restore', () => {
  it('when a backup is restored into an empty database and bucket, then the rows, the triggers and the file bytes come back', async () => {
    const { DB_SOCKET, DB_NAME } = inject('dbEnv');
    const user = await createUser('engineer', { name: 'Backup Person' });
    const recipe = await RecipeModel.create({ code: `BK-${randomBytes(4).toString('hex').toUpperCase()}`, name: 'Backup recipe', product: 'Backup', notes: '', createdBy: user.id });
    const version = await RecipeVersionModel.create({ recipeId: recipe.id, number: 1, state: 'draft', content: { steps: [] }, contentHash: '0'.repeat(64), authorId: user.id });
    const storage = createFileStorage(loadEnv({ DB_PASSWORD: 'x', JWT_SECRET: 'x'.repeat(32), S3_ENDPOINT: s3.endpoint, S3_BUCKET: 'backup-source' }));
    await storage.ensureBucket();
    const bytes = randomBytes(50_000);
    await storage.put('artwork/trace-layer.png', bytes, 'image/png');

    const manifest = await backupTo(folder, { socket: DB_SOCKET as string, database: DB_NAME as string, s3: { endpoint: s3.endpoint, bucket: 'backup-source' } });
    expect(manifest.objects).toHaveLength(1);

    const restoredDb = `restore_check_${randomBytes(3).toString('hex')}`;
    await restoreFrom(folder, { socket: DB_SOCKET as string, database: restoredDb, s3: { endpoint: s3.endpoint, bucket: 'backup-target' } });

    // The app account has no rights on the restored database; read it as the instance's root.
    const name = execFileSync('mariadb', ['--no-defaults', `--socket=${DB_SOCKET}`, '-uroot', '-N', '-B', '-e', `SELECT name FROM ${restoredDb}.users WHERE id = ${user.id}`], { encoding: 'utf8' }).trim();
    expect(name).toBe('Backup Person');
    const triggers = execFileSync('mariadb', ['--no-defaults', `--socket=${DB_SOCKET}`, '-uroot', '-N', '-B', '-e', `SELECT TRIGGER_NAME FROM information_schema.TRIGGERS WHERE TRIGGER_SCHEMA = '${restoredDb}'`], { encoding: 'utf8' }).trim();
    // Append-only audit and signatures, frozen released recipe versions, kept readings and
    // deviations (migrations 0002, 0006, 0007, 0010, 0011), read-only closed deviations, their
    // history and signed dispositions, run sign-offs and trend notes (0013–0017).
    expect(triggers.split('\n').sort()).toEqual([
      'audit_events_no_delete',
      'audit_events_no_update',
      'deviation_dispositions_kept',
      'deviation_dispositions_no_delete',
      'deviation_events_no_delete',
      'deviation_events_no_update',
      'deviations_closed_frozen',
      'deviations_no_delete',
      'recipe_versions_frozen',
      'recipe_versions_no_delete',
      'run_readings_kept',
      'run_readings_no_delete',
      'run_sign_offs_no_delete',
      'run_sign_offs_no_update',
      'signatures_no_delete',
      'signatures_no_update',
      'trend_baselines_no_delete',
      'trend_baselines_no_update',
      'trend_point_notes_no_delete',
      'trend_point_notes_no_update',
    ]);
    // Generated columns (the one-open-version keys) must not break the reload of version rows.
    const openSlot = execFileSync('mariadb', ['--no-defaults', `--socket=${DB_SOCKET}`, '-uroot', '-N', '-B', '-e', `SELECT open_slot FROM ${restoredDb}.recipe_versions WHERE id = ${version.id}`], { encoding: 'utf8' }).trim();
    expect(Number(openSlot)).toBe(recipe.id);

    const client = new S3Client({ region: 'us-east-1', endpoint: s3.endpoint, forcePathStyle: true, credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } });
    const back = await client.send(new GetObjectCommand({ Bucket: 'backup-target', Key: 'artwork/trace-layer.png' }));
    expect(Buffer.from((await back.Body?.transformToByteArray()) ?? []).equals(bytes)).toBe(true);
    execFileSync('mariadb', ['--no-defaults', `--socket=${DB_SOCKET}`, '-uroot', '-e', `DROP DATABASE ${restoredDb}`]);
  });
});
