import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import { PNG } from 'pngjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { StoredFileSchema } from '@tracewright/shared';
import { PHOTO_MAX_BYTES } from '@tracewright/shared';

import { startS3Fake, type S3Fake } from '../dev/s3-fake';
import { StoredFileModel } from '../models/stored-file.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { createRunRecords, newKey, planRun, post, releasedVersion, runnableContent } from '../../test/run-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let s3: S3Fake;
let s3Dir: string;
let operator: SignedIn;
let engineer: SignedIn;
beforeAll(async () => {
  s3Dir = mkdtempSync(join(tmpdir(), 'tw-s3-'));
  s3 = await startS3Fake({ directory: s3Dir });
  t = await createTestContext({ S3_ENDPOINT: s3.endpoint, S3_BUCKET: 'photo-tests' });
  await t.ctx.storage.ensureBucket();
  [operator, engineer] = await Promise.all([signedInUser(t.app, 'operator'), signedInUser(t.app, 'engineer')]);
});
afterAll(async () => {
  await t.close();
  await s3.close();
  rmSync(s3Dir, { recursive: true, force: true });
});

// The smallest headers file-type recognises; a browser would not draw them, the server never needs to.
const JPEG = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]), Buffer.from('JFIF\0', 'latin1'), Buffer.alloc(64, 0x20), Buffer.from([0xff, 0xd9])]);
const WEBP = Buffer.concat([Buffer.from('RIFF', 'latin1'), Buffer.from([0x24, 0, 0, 0]), Buffer.from('WEBPVP8 ', 'latin1'), Buffer.alloc(32, 0)]);
const GIF = Buffer.concat([Buffer.from('GIF89a', 'latin1'), Buffer.alloc(32, 0)]);
const png = () => {
  const image = new PNG({ width: 4, height: 4 });
  image.data.fill(255);
  return PNG.sync.write(image);
};

const upload = (who: SignedIn, bytes: Buffer, filename: string, key?: string) => {
  const req = who.agent.post('/api/files/photos').set('X-CSRF-Token', who.csrf);
  return (key ? req.set('Idempotency-Key', key) : req).attach('file', bytes, { filename, contentType: 'application/octet-stream' });
};
const photosBy = (who: SignedIn) => StoredFileModel.count({ where: { uploadedBy: who.user.id } });

describe('/api/files/photos', () => {
  it.each([
    ['a JPEG', JPEG, 'image/jpeg', /^photos\/[0-9a-f-]{36}\.jpg$/],
    ['a PNG', png(), 'image/png', /^photos\/[0-9a-f-]{36}\.png$/],
    ['a WebP', WEBP, 'image/webp', /^photos\/[0-9a-f-]{36}\.webp$/],
  ])('when an operator uploads %s, then it is stored under our own key and reads back inline', async (_label, bytes, contentType, key) => {
    const res = await upload(operator, bytes, 'camera.bin');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(StoredFileSchema.parse(res.body)).toMatchObject({ contentType, sizeBytes: bytes.length });
    expect((await StoredFileModel.findByPk(res.body.id))?.storageKey).toMatch(key);
    const back = await engineer.agent.get(`/api/files/${res.body.id}`);
    expect(back.headers['content-type']).toBe(contentType);
    expect(back.headers['content-disposition']).toBeUndefined();
  });

  it('when the same upload is retried with its key, then one file is stored and the answer is replayed', async () => {
    const key = newKey();
    const before = await photosBy(operator);
    const first = await upload(operator, JPEG, 'a.jpg', key);
    const second = await upload(operator, JPEG, 'a.jpg', key);
    expect(second.body).toEqual(first.body);
    expect(second.headers['idempotent-replay']).toBe('true');
    expect(await photosBy(operator)).toBe(before + 1);
    expect((await upload(operator, png(), 'b.png', key)).status).toBe(422);
  });

  it('when the file is a GIF, empty, missing or over 15 MB, then it is refused and nothing is stored', async () => {
    const before = await photosBy(operator);
    const gif = await upload(operator, GIF, 'photo.jpg');
    expect(gif.status).toBe(415);
    expect(gif.body.error.message).toMatch(/JPEG, PNG or WebP.*GIF/);
    expect((await upload(operator, Buffer.alloc(0), 'empty.jpg')).status).toBe(400);
    expect((await operator.agent.post('/api/files/photos').set('X-CSRF-Token', operator.csrf).send({})).status).toBe(400);
    const huge = await upload(operator, Buffer.concat([JPEG, Buffer.alloc(PHOTO_MAX_BYTES)]), 'huge.jpg');
    expect(huge.status).toBe(413);
    expect(huge.body.error.message).toMatch(/larger than 15 MB/);
    expect(await photosBy(operator)).toBe(before);
  });

  it('when a problem is reported with a photo, then its deviation carries the photo', async () => {
    const { versionId } = await releasedVersion(runnableContent(await createRunRecords()));
    const run = await planRun(engineer, { versionId, quantity: 1 });
    const photo = await upload(operator, JPEG, 'smear.jpg');
    const res = await post(operator, `/api/runs/${run.id}/problems`, { description: 'Smear across key 2.', severity: 'minor', photoFileIds: [photo.body.id] });
    expect(res.status).toBe(201);
    expect(res.body.deviation.photoFileIds).toEqual([photo.body.id]);
  });
});
