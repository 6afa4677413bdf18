import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, normalize } from 'node:path';

import {
  GetObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  CreateBucketCommand,
  HeadBucketCommand,
} from '@aws-sdk/client-s3';

export interface BackupTarget {
  socket: string;
  database: string;
  s3: { endpoint: string; bucket: string; accessKeyId?: string; secretAccessKey?: string; region?: string };
}

export interface BackupManifest {
  createdAt: string;
  database: string;
  objects: Array<{ key: string; sizeBytes: number; sha256: string; contentType: string }>;
}

const s3Client = (t: BackupTarget['s3']) =>
  new S3Client({
    region: t.region ?? 'us-east-1',
    endpoint: t.endpoint,
    forcePathStyle: true,
    credentials: { accessKeyId: t.accessKeyId ?? 'S3RVER', secretAccessKey: t.secretAccessKey ?? 'S3RVER' },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });

/**
 * A consistent dump (one InnoDB snapshot: --single-transaction) plus every stored file, in one
 * folder with a manifest of checksums so a restore can prove it brought back the same bytes.
 */
export async function backupTo(folder: string, target: BackupTarget, now = new Date()): Promise<BackupManifest> {
  mkdirSync(join(folder, 'files'), { recursive: true });
  const dump = execFileSync(
    'mariadb-dump',
    ['--no-defaults', `--socket=${target.socket}`, '-uroot', '--single-transaction', '--triggers', '--routines', '--skip-comments', target.database],
    { maxBuffer: 1 << 30 },
  );
  writeFileSync(join(folder, 'database.sql'), dump);

  const client = s3Client(target.s3);
  const objects: BackupManifest['objects'] = [];
  let token: string | undefined;
  do {
    const page = await client.send(new ListObjectsV2Command({ Bucket: target.s3.bucket, ContinuationToken: token }));
    for (const item of page.Contents ?? []) {
      if (!item.Key) continue;
      const object = await client.send(new GetObjectCommand({ Bucket: target.s3.bucket, Key: item.Key }));
      const body = Buffer.from((await object.Body?.transformToByteArray()) ?? []);
      const path = safePath(folder, item.Key);
      mkdirSync(dirname(path), { recursive: true });
      writeFileSync(path, body);
      objects.push({ key: item.Key, sizeBytes: body.length, sha256: sha256(body), contentType: object.ContentType ?? 'application/octet-stream' });
    }
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);

  const manifest: BackupManifest = { createdAt: now.toISOString(), database: target.database, objects };
  writeFileSync(join(folder, 'manifest.json'), JSON.stringify(manifest, null, 2));
  return manifest;
}

/** Replaces the target database with the dump and uploads every file, checking each checksum. */
export async function restoreFrom(folder: string, target: BackupTarget): Promise<BackupManifest> {
  const manifest = JSON.parse(readFileSync(join(folder, 'manifest.json'), 'utf8')) as BackupManifest;
  for (const item of manifest.objects) {
    if (sha256(readFileSync(safePath(folder, item.key))) !== item.sha256) {
      throw new Error(`Backup file ${item.key} does not match its checksum; the backup is damaged.`);
    }
  }
  const db = `\`${target.database.replace(/`/g, '')}\``;
  const client = ['--no-defaults', `--socket=${target.socket}`, '-uroot'];
  execFileSync('mariadb', [...client, '-e', `DROP DATABASE IF EXISTS ${db}; CREATE DATABASE ${db} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`]);
  execFileSync('mariadb', [...client, target.database], { input: readFileSync(join(folder, 'database.sql')), maxBuffer: 1 << 30 });

  const s3 = s3Client(target.s3);
  try {
    await s3.send(new HeadBucketCommand({ Bucket: target.s3.bucket }));
  } catch {
    await s3.send(new CreateBucketCommand({ Bucket: target.s3.bucket }));
  }
  for (const item of manifest.objects) {
    const body = readFileSync(safePath(folder, item.key));
    await s3.send(new PutObjectCommand({ Bucket: target.s3.bucket, Key: item.key, Body: body, ContentType: item.contentType }));
  }
  return manifest;
}

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

/** Keys are ours, but a damaged manifest must still never write outside the backup folder. */
function safePath(folder: string, key: string): string {
  const path = normalize(join(folder, 'files', key));
  if (!path.startsWith(normalize(join(folder, 'files')) + '/')) throw new Error(`Refusing unsafe file key ${key}.`);
  return path;
}
