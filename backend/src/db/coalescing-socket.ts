import { connect, type Socket } from 'node:net';

/**
 * A socket to the database that sends what is written to it in one tick as one buffer. The
 * mariadb connector sends each query the moment it is issued, so queries issued together (it
 * pipelines them: Promise.all over one transaction's connection) would cost a system call each;
 * on this kind of machine those calls were the largest single cost of a tablet write's CPU
 * (`npm run bench -- --only=writes`). Joined for the rest of the tick, they leave in one write.
 */
export function coalescingSocket(port: number, host: string): Socket {
  const socket = connect(port, host);
  const write = socket.write.bind(socket) as (chunk: Buffer) => boolean;
  let waiting: Buffer[] = [];
  const flush = () => {
    const chunks = waiting;
    waiting = [];
    if (!socket.destroyed) write(chunks.length === 1 ? (chunks[0] as Buffer) : Buffer.concat(chunks));
  };
  socket.write = ((chunk: Buffer | string) => {
    if (waiting.length === 0) process.nextTick(flush);
    waiting.push(typeof chunk === 'string' ? Buffer.from(chunk) : Buffer.from(chunk));
    return true;
  }) as Socket['write'];
  return socket;
}
