import { createServer, type AddressInfo, type Server } from 'node:net';

import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { coalescingSocket } from './coalescing-socket';

let server: Server;
let received: Buffer[] = [];
beforeAll(async () => {
  server = createServer((peer) => peer.on('data', (chunk: Buffer) => received.push(chunk)));
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
});
afterAll(() => new Promise<void>((done) => server.close(() => done())));

describe('coalescing socket', () => {
  it('when several buffers are written in one tick and the writer reuses its buffer at once, then the peer gets every byte as written, in order', async () => {
    received = [];
    const socket = coalescingSocket((server.address() as AddressInfo).port, '127.0.0.1');
    await new Promise((done) => socket.once('connect', done));
    // The database connector fills one output buffer and hands out views of it: a deferred write must copy.
    const scratch = Buffer.from('AAAA');
    socket.write(scratch);
    scratch.write('BBBB');
    socket.write(scratch);
    socket.write('CC');
    scratch.fill(0);
    await new Promise((done) => setTimeout(done, 100));
    socket.destroy();
    expect(Buffer.concat(received).toString('latin1')).toBe('AAAABBBBCC');
  });
});
