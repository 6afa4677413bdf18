import request from 'supertest';
import express from 'express';
import { describe, expect, it } from 'vitest';

import { hasLoneSurrogate, refuseBrokenText } from './well-formed-text';

// Unicode Standard §3.9 (D91): a well-formed UTF-16 string has no unpaired surrogate code unit.
describe('broken text in requests', () => {
  it.each([
    ['a lone high surrogate', 'a\ud800b', true],
    ['a lone low surrogate', '\udc00', true],
    ['a high surrogate at the end', 'ok\udbff', true],
    ['two high surrogates', '\ud800\ud800\udc00', true],
    ['an emoji (a proper pair)', 'Ag trace 👍', false],
    ['plain text with accents', 'Überprüfung µm', false],
  ])('when text holds %s, then it is judged broken: %s', (_label, text, broken) => {
    expect(hasLoneSurrogate(text)).toBe(broken);
  });

  it('when a JSON body hides a lone surrogate in a nested value or a key, then 400; a well-formed one passes', async () => {
    const app = express();
    app.use(express.json());
    app.use(refuseBrokenText);
    app.post('/x', (_req, res) => {
      res.json({ ok: true });
    });
    app.use(((err: { status?: number; message: string }, _req, res, _next) => {
      res.status(err.status ?? 500).json({ message: err.message });
    }) as express.ErrorRequestHandler);
    const send = (raw: string) => request(app).post('/x').set('content-type', 'application/json').send(raw);
    expect((await send('{"a":[{"b":"x\\ud800"}]}')).status).toBe(400);
    expect((await send('{"\\udc00":"x"}')).status).toBe(400);
    expect((await send('{"a":"\\ud83d\\udc4d"}')).status).toBe(200);
    expect((await request(app).post('/x?q=%ED%A0%80').send({})).status).toBe(200); // percent-encoded bytes never decode to a lone surrogate
  });
});
