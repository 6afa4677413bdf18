import { createServer } from 'node:net';

import express from 'express';
import { QueryTypes, Sequelize, type Transaction } from 'sequelize';
import { AccessDeniedError, ConnectionAcquireTimeoutError, ConnectionError, ConnectionRefusedError, ConnectionTimedOutError, DatabaseError, HostNotReachableError, UniqueConstraintError } from 'sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

import { createUser } from '../../test/fixtures';
import { createApp } from '../app';
import { createTestContext, type TestContext } from '../../test/test-context';
import { databaseTrouble, errorHandler } from './error-handler';

// Errors the database raises while it is down, restarting or contended must become 503 with a
// Retry-After (the tablet retries with its key), never 500. Most are produced for real here.
let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
  // Sequelize warns on the console when it drops a connection that died mid-transaction: expected here.
  vi.spyOn(console, 'warn').mockImplementation(() => undefined);
});
afterAll(async () => {
  vi.restoreAllMocks();
  await t.close();
});

/** What the single error handler answers when a handler throws `error`. */
function answerTo(error: unknown) {
  const app = express();
  app.get('/boom', () => {
    throw error;
  });
  app.use(errorHandler(t.ctx));
  return request(app).get('/boom');
}

async function failureOf(work: Promise<unknown>): Promise<unknown> {
  try {
    await work;
  } catch (error) {
    return error;
  }
  throw new Error('expected the database call to fail');
}

/** A loopback port nothing listens on: connecting there is refused at once. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
  const { port } = server.address() as { port: number };
  await new Promise((done) => server.close(done));
  return port;
}

/** A Sequelize of its own (models stay bound to the test context's), as the app account. */
const sequelizeAt = (port: number, pool: { max: number; acquire: number } = { max: 2, acquire: 2_000 }) =>
  new Sequelize(t.env.DB_NAME, t.env.DB_USER, t.env.DB_PASSWORD, { host: t.env.DB_HOST, port, dialect: 'mariadb', logging: false, pool });

const connectionId = async (transaction: Transaction) =>
  (await t.ctx.sequelize.query<{ id: number }>('SELECT CONNECTION_ID() AS id', { transaction, type: QueryTypes.SELECT }))[0]?.id;

async function expectUnavailable(error: unknown, retryAfter: string) {
  const res = await answerTo(error);
  expect(res.status, String(error)).toBe(503);
  expect(res.headers['retry-after']).toBe(retryAfter);
  expect(res.body.error.code).toBe('SERVICE_UNAVAILABLE');
}

describe('database errors → 503 with Retry-After', () => {
  it('when the database refuses connections, then a query error and the health check are 503 with Retry-After', async () => {
    const down = sequelizeAt(await closedPort());
    try {
      const error = await failureOf(down.query('SELECT 1'));
      expect(error).toBeInstanceOf(ConnectionRefusedError);
      await expectUnavailable(error, '5');
      const health = await request(createApp({ ...t.ctx, sequelize: down })).get('/api/health');
      expect(health.status).toBe(503);
      expect(health.headers['retry-after']).toBe('5');
    } finally {
      await down.close();
    }
  });

  it('when the connection is killed inside a transaction, then the next statement fails as 503', async () => {
    const error = await failureOf(
      t.ctx.sequelize.transaction(async (transaction) => {
        await t.ctx.sequelize.query(`KILL CONNECTION ${await connectionId(transaction)}`);
        await t.ctx.sequelize.query('SELECT 1', { transaction });
      }),
    );
    expect(databaseTrouble(error)?.kind).toBe('down');
    await expectUnavailable(error, '5');
  });

  it('when the connection is killed just before COMMIT, then the commit fails as 503', async () => {
    const error = await failureOf(
      t.ctx.sequelize.transaction(async (transaction) => {
        await t.ctx.sequelize.query(`KILL CONNECTION ${await connectionId(transaction)}`);
      }),
    );
    await expectUnavailable(error, '5');
  });

  it('when no pooled connection frees up in time, then the acquire timeout is 503', async () => {
    const tiny = sequelizeAt(t.env.DB_PORT, { max: 1, acquire: 200 });
    try {
      const held = await tiny.transaction();
      const error = await failureOf(tiny.query('SELECT 1'));
      await held.rollback();
      expect(error).toBeInstanceOf(ConnectionAcquireTimeoutError);
      await expectUnavailable(error, '5');
    } finally {
      await tiny.close();
    }
  });

  it('when two writes lock rows in opposite order, then the deadlock victim gets 503 with a short Retry-After', async () => {
    const [a, b] = await Promise.all([createUser('operator'), createUser('operator')]);
    const lock = (id: number, transaction: Transaction) => t.ctx.sequelize.query('SELECT id FROM users WHERE id = ? FOR UPDATE', { replacements: [id], transaction });
    const [first, second] = [await t.ctx.sequelize.transaction(), await t.ctx.sequelize.transaction()];
    await lock(a.id, first);
    await lock(b.id, second);
    const outcomes = await Promise.allSettled([lock(b.id, first), lock(a.id, second)]);
    await Promise.allSettled([first.rollback(), second.rollback()]);
    const victim = outcomes.find((o) => o.status === 'rejected');
    expect(victim).toBeDefined();
    expect(databaseTrouble((victim as PromiseRejectedResult).reason)).toEqual({ kind: 'busy', code: 'ER_LOCK_DEADLOCK' });
    await expectUnavailable((victim as PromiseRejectedResult).reason, '1');
  });

  it.each([
    ['ConnectionRefusedError', new ConnectionRefusedError(new Error('connect ECONNREFUSED 127.0.0.1:3307'))],
    ['ConnectionAcquireTimeoutError', new ConnectionAcquireTimeoutError(new Error('Operation timeout'))],
    ['ConnectionTimedOutError', new ConnectionTimedOutError(new Error('connect ETIMEDOUT'))],
    ['HostNotReachableError', new HostNotReachableError(new Error('connect EHOSTUNREACH'))],
    ['AccessDeniedError (the app account was changed under us)', new AccessDeniedError(new Error('Access denied'))],
    ['plain SequelizeConnectionError', new ConnectionError(new Error('socket has unexpectedly been closed'))],
  ])('when Sequelize raises %s, then 503 with Retry-After', async (_name, error) => {
    await expectUnavailable(error, '5');
  });

  it.each([
    ['ER_SOCKET_UNEXPECTED_CLOSE', 'socket has unexpectedly been closed'],
    ['ER_CONNECTION_ALREADY_CLOSED', 'Cannot execute new commands: connection closed'],
    ['ER_CMD_CONNECTION_CLOSED', 'Cannot execute new commands: connection closed'],
    ['ER_CMD_NOT_EXECUTED_DESTROYED', 'Command not executed: the connection was destroyed'],
    ['ER_GET_CONNECTION_TIMEOUT', 'retrieve connection from pool timeout'],
    ['ER_SERVER_SHUTDOWN', 'Server shutdown in progress'],
    ['ER_CONNECTION_KILLED', 'Connection was killed'],
    ['ECONNRESET', 'read ECONNRESET'],
    ['EPIPE', 'write EPIPE'],
  ])('when a query fails with the driver code %s, then 503 with Retry-After', async (code, message) => {
    await expectUnavailable(new DatabaseError(Object.assign(new Error(message), { code, sql: 'COMMIT' })), '5');
  });

  it('when a lock wait times out, then 503 with a short Retry-After', async () => {
    await expectUnavailable(new DatabaseError(Object.assign(new Error('Lock wait timeout exceeded'), { code: 'ER_LOCK_WAIT_TIMEOUT', sql: 'SELECT 1' })), '1');
  });
});

describe('errors that are not the database being away', () => {
  it('when the SQL itself is wrong, then 500 (a bug to fix, not a retry)', async () => {
    const error = await failureOf(t.ctx.sequelize.query('SELEC 1'));
    expect(databaseTrouble(error)).toBeNull();
    expect((await answerTo(error)).status).toBe(500);
  });

  it('when a unique key is hit, then 409 as before', async () => {
    expect((await answerTo(new UniqueConstraintError({ message: 'Validation error' }))).status).toBe(409);
  });

  it('when a plain error escapes, then 500 without a Retry-After', async () => {
    const res = await answerTo(new Error('unexpected'));
    expect(res.status).toBe(500);
    expect(res.headers['retry-after']).toBeUndefined();
  });
});
