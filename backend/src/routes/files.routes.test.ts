import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { deflateSync } from 'node:zlib';

import { PNG } from 'pngjs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { ARTWORK_MAX_BYTES, StoredFileSchema } from '@tracewright/shared';

import { startS3Fake, type S3Fake } from '../dev/s3-fake';
import { AuditEventModel } from '../models/audit-event.model';
import { StoredFileModel } from '../models/stored-file.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let s3: S3Fake;
let s3Dir: string;
let engineer: SignedIn;
let operator: SignedIn;
beforeAll(async () => {
  s3Dir = mkdtempSync(join(tmpdir(), 'tw-s3-'));
  s3 = await startS3Fake({ directory: s3Dir });
  t = await createTestContext({ S3_ENDPOINT: s3.endpoint, S3_BUCKET: 'artwork-tests' });
  await t.ctx.storage.ensureBucket();
  [engineer, operator] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'operator')]);
});
afterAll(async () => {
  await t.close();
  await s3.close();
  rmSync(s3Dir, { recursive: true, force: true });
});

const upload = (who: SignedIn, bytes: Buffer, filename: string, field = 'file') =>
  who.agent.post('/api/files/artwork').set('X-CSRF-Token', who.csrf).attach(field, bytes, { filename, contentType: 'application/octet-stream' });
const uploadsBy = (who: SignedIn) => StoredFileModel.count({ where: { uploadedBy: who.user.id } });
const binary = (res: request.Test) => res.buffer(true).parse((r, done) => {
  const chunks: Buffer[] = [];
  r.on('data', (c: Buffer) => chunks.push(c));
  r.on('end', () => done(null, Buffer.concat(chunks)));
});

function pngBytes(): Buffer {
  const png = new PNG({ width: 8, height: 4 });
  png.data.fill(0);
  for (let i = 0; i < png.data.length; i += 4) png.data[i + 3] = 255;
  return PNG.sync.write(png);
}

// Minimal PDFs; only the markers the check reads matter, not a viewer-perfect layout.
const pdf = (body: string) => Buffer.from(`%PDF-1.7\n${body}\ntrailer << /Root 1 0 R >>\n%%EOF\n`, 'latin1');
const CLEAN_PDF = pdf('1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj\n2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj');
function pdfWithHiddenScript(): Buffer {
  const hidden = deflateSync(Buffer.from('3 0 << /S /JavaScript /JS (app.alert(1)) >>', 'latin1'));
  const head = Buffer.from(`%PDF-1.7\n1 0 obj << /Type /Catalog /OpenAction 3 0 R >> endobj\n4 0 obj << /Type /ObjStm /N 1 /First 4 /Filter /FlateDecode /Length ${hidden.length} >>\nstream\n`, 'latin1');
  return Buffer.concat([head, hidden, Buffer.from('\nendstream\nendobj\n%%EOF\n', 'latin1')]);
}

describe('/api/files/artwork', () => {
  it('when an engineer uploads a PNG, then it reads back byte-identical with safe headers, and the upload is audited', async () => {
    const bytes = pngBytes();
    const res = await upload(engineer, bytes, 'key-layer.png');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(StoredFileSchema.parse(res.body)).toEqual({ id: res.body.id, contentType: 'image/png', sizeBytes: bytes.length, displayName: 'key-layer.png' });
    const back = await binary(operator.agent.get(`/api/files/${res.body.id}`));
    expect(back.status).toBe(200);
    expect(Buffer.compare(back.body as Buffer, bytes)).toBe(0);
    expect(back.headers['content-type']).toBe('image/png');
    expect(back.headers['x-content-type-options']).toBe('nosniff');
    expect(back.headers['content-disposition']).toBeUndefined();
    const row = await StoredFileModel.findByPk(res.body.id);
    expect(row?.storageKey).toMatch(/^artwork\/[0-9a-f-]{36}\.png$/);
    expect(await AuditEventModel.count({ where: { action: 'file.uploaded', entityType: 'file', entityId: String(res.body.id), actorId: engineer.user.id } })).toBe(1);
  });

  it('when an .exe is renamed .png, then 415 and nothing is stored', async () => {
    const exe = Buffer.concat([Buffer.from('MZ\x90\x00\x03\x00\x00\x00\x04\x00\x00\x00\xff\xff', 'latin1'), Buffer.alloc(200, 0x41), Buffer.from('PE\0\0', 'latin1')]);
    const before = await uploadsBy(engineer);
    const res = await upload(engineer, exe, 'artwork.png');
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/PNG, SVG or PDF.*EXE/);
    expect(await uploadsBy(engineer)).toBe(before);
  });

  it('when the file is over 10 MB, then 413; when it is empty, then 400; when it is missing, then 400; nothing is stored', async () => {
    const before = await uploadsBy(engineer);
    const huge = Buffer.concat([pngBytes(), Buffer.alloc(ARTWORK_MAX_BYTES)]);
    const tooLarge = await upload(engineer, huge, 'huge.png');
    expect(tooLarge.status).toBe(413);
    expect(tooLarge.body.error.code).toBe('PAYLOAD_TOO_LARGE');
    const empty = await upload(engineer, Buffer.alloc(0), 'empty.png');
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toMatch(/empty/);
    expect((await upload(engineer, pngBytes(), 'x.png', 'artwork')).status).toBe(400);
    expect((await engineer.agent.post('/api/files/artwork').set('X-CSRF-Token', engineer.csrf).send({})).status).toBe(400);
    expect(await uploadsBy(engineer)).toBe(before);
  });

  it('when an SVG carries scripts, handlers, foreign objects and outside links, then it is stored sanitised and served sandboxed', async () => {
    const svg = `<?xml version="1.0"?>
<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" viewBox="0 0 20 10" onload="alert(1)">
  <script>alert(document.cookie)</script>
  <foreignObject width="5" height="5"><div xmlns="http://www.w3.org/1999/xhtml">x</div></foreignObject>
  <image href="https://tracker.example/p.png" width="1" height="1"/>
  <path id="trace" d="M1 5 H19" stroke="black" onclick="alert(2)"/>
  <use xlink:href="#trace" y="2"/>
</svg>`;
    const res = await upload(engineer, Buffer.from(svg), 'keys.svg');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.contentType).toBe('image/svg+xml');
    const back = await binary(operator.agent.get(`/api/files/${res.body.id}`));
    const text = (back.body as Buffer).toString('utf8');
    expect(text).not.toMatch(/<script|onload|onclick|foreignObject|tracker\.example/i);
    expect(text).toContain('<path id="trace" d="M1 5 H19" stroke="black"/>');
    expect(text).toContain('xlink:href="#trace"');
    expect(back.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(back.headers['content-security-policy']).toBe("sandbox; default-src 'none'; style-src 'unsafe-inline'");
    expect(res.body.sizeBytes).toBe((back.body as Buffer).length);
  });

  it('when text that is not an SVG is uploaded as .svg, then 415', async () => {
    expect((await upload(engineer, Buffer.from('<html><script>x</script></html>'), 'a.svg')).status).toBe(415);
    expect((await upload(engineer, Buffer.from('<svg><g></svg>'), 'b.svg')).status).toBe(415);
  });

  it.each([
    ['a plain JavaScript open action', pdf('1 0 obj << /Type /Catalog /OpenAction << /S /JavaScript /JS (app.alert(1)) >> >> endobj')],
    ['a name escaped as /J#61vaScript', pdf('1 0 obj << /Type /Catalog /AA << /O << /S /J#61vaScript /JS (x) >> >> >> endobj')],
    ['a script hidden in a compressed object stream', pdfWithHiddenScript()],
  ])('when a PDF carries %s, then it is refused with 422 and nothing is stored', async (_label, bytes) => {
    const before = await uploadsBy(engineer);
    const res = await upload(engineer, bytes, 'layer.pdf');
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/PDF was refused: it contains JavaScript/);
    expect(await uploadsBy(engineer)).toBe(before);
  });

  it('when a clean PDF is uploaded, then it is served as a download under its cleaned name', async () => {
    const res = await upload(engineer, CLEAN_PDF, '..\\..\\etc\\cover\u202Efdp.exe.pdf');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.displayName).toBe('coverfdp.exe.pdf');
    const back = await binary(operator.agent.get(`/api/files/${res.body.id}`));
    expect(Buffer.compare(back.body as Buffer, CLEAN_PDF)).toBe(0);
    expect(back.headers['content-type']).toBe('application/pdf');
    expect(back.headers['content-disposition']).toBe('attachment; filename=coverfdp.exe.pdf');
  });

  it('when an operator uploads, then 403; when nobody is signed in, then 401; an unknown file id is 404', async () => {
    const before = await uploadsBy(operator);
    expect((await upload(operator, pngBytes(), 'x.png')).status).toBe(403);
    expect(await uploadsBy(operator)).toBe(before);
    expect((await request(t.app).post('/api/files/artwork').attach('file', pngBytes(), 'x.png')).status).toBe(401);
    expect((await engineer.agent.get('/api/files/2147483000')).status).toBe(404);
    expect((await engineer.agent.get('/api/files/abc')).status).toBe(400);
  });
});
