import { spawn, spawnSync, execFileSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';

import { ensureDebianPackage } from './debian-packages';

const MARIADBD = '/usr/sbin/mariadbd';
const INSTALL_DB = '/usr/bin/mariadb-install-db';
const ADMIN = '/usr/bin/mariadb-admin';
const CLIENT = '/usr/bin/mariadb';

export interface MariadbInstance {
  port: number;
  socket: string;
  dataDir: string;
  /** Runs SQL as the socket-authenticated root of this private instance. */
  rootSql(sql: string): string;
  stop(): Promise<void>;
  /** The server process, for fault tests that must kill it hard. */
  process(): ChildProcess;
  restart(): Promise<void>;
}

export function ensureMariadbInstalled(): void {
  ensureDebianPackage(MARIADBD, ['mariadb-server', 'mariadb-client']);
}

const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;

/**
 * Starts a private MariaDB on 127.0.0.1 with its own data folder, initialising it on first use.
 * Durable defaults are kept (innodb_flush_log_at_trx_commit=1); memory settings are small
 * because a developer runs two instances (demo + tests) side by side on 2 cores.
 */
export async function startMariadb(options: { baseDir: string; port: number; reuseRunning?: boolean }): Promise<MariadbInstance> {
  ensureMariadbInstalled();
  const baseDir = resolve(options.baseDir);
  const dataDir = join(baseDir, 'data');
  const runDir = join(baseDir, 'run');
  mkdirSync(runDir, { recursive: true });
  const socket = join(runDir, 'mariadb.sock');
  const pidFile = join(runDir, 'mariadb.pid');
  const userArgs = isRoot() ? ['--user=root'] : [];

  // Each instance keeps its temporary tables in its own folder: instances started side by side
  // (demo, tests, bench) must not share /tmp, where their bootstrap files can collide.
  const tmpDir = join(runDir, 'tmp');
  mkdirSync(tmpDir, { recursive: true });
  if (!existsSync(join(dataDir, 'mysql'))) {
    mkdirSync(dataDir, { recursive: true });
    const result = spawnSync(
      INSTALL_DB,
      ['--no-defaults', `--datadir=${dataDir}`, `--tmpdir=${tmpDir}`, ...userArgs, '--auth-root-authentication-method=socket', '--skip-test-db'],
      { encoding: 'utf8' },
    );
    if (result.status !== 0) {
      rmSync(dataDir, { recursive: true, force: true });
      throw new Error(`Initialising MariaDB's data folder failed:\n${(result.stderr || result.stdout || '').slice(-2000)}`);
    }
  }
  const rootSql = (sql: string) =>
    execFileSync(CLIENT, ['--no-defaults', `--socket=${socket}`, '-uroot', '-N', '-B', '-e', sql], {
      encoding: 'utf8',
    });
  if (options.reuseRunning && ping(socket)) {
    // Someone else (a running `npm start`) owns this server: use it, never stop it.
    return {
      port: options.port,
      socket,
      dataDir,
      rootSql,
      process: () => {
        throw new Error('This MariaDB belongs to another process.');
      },
      restart: () => Promise.reject(new Error('This MariaDB belongs to another process.')),
      stop: () => Promise.resolve(),
    };
  }
  await stopStale(socket, pidFile);

  const args = [
    '--no-defaults',
    ...userArgs,
    `--datadir=${dataDir}`,
    `--tmpdir=${tmpDir}`,
    `--socket=${socket}`,
    `--pid-file=${pidFile}`,
    `--port=${options.port}`,
    '--bind-address=127.0.0.1',
    '--skip-networking=0',
    '--skip-name-resolve',
    `--log-error=${join(runDir, 'mariadb.err')}`,
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    '--innodb-buffer-pool-size=64M',
    '--innodb-log-file-size=16M',
    '--performance-schema=OFF',
    '--max-connections=200',
    '--skip-log-bin',
    '--default-time-zone=+00:00',
    '--innodb-ft-min-token-size=2', // the deviation queue finds 2-letter words such as "Ag" through its FULLTEXT index
  ];
  let child = await launch(args, socket, runDir);

  return {
    port: options.port,
    socket,
    dataDir,
    rootSql,
    process: () => child,
    async restart() {
      // Same port, socket and data folder. The old process must be gone first (even one just sent
      // SIGKILL): a second mariadbd on the same data folder fails on InnoDB's file lock.
      await shutDown(child, socket);
      child = await launch(args, socket, runDir);
    },
    stop: () => shutDown(child, socket),
  };
}

async function shutDown(child: ChildProcess, socket: string): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise((done) => child.once('exit', done));
  try {
    execFileSync(ADMIN, ['--no-defaults', `--socket=${socket}`, '-uroot', 'shutdown'], { stdio: 'pipe' });
  } catch {
    child.kill('SIGTERM');
  }
  // mariadb-admin returns before the server has exited: wait on the process itself.
  await Promise.race([exited, sleep(30_000, undefined, { ref: false })]);
}

async function launch(args: string[], socket: string, runDir: string): Promise<ChildProcess> {
  const child = spawn(MARIADBD, args, { stdio: 'ignore' });
  for (let attempt = 0; attempt < 300; attempt += 1) {
    if (child.exitCode !== null) break;
    if (ping(socket)) return child;
    await sleep(100);
  }
  const log = existsSync(join(runDir, 'mariadb.err')) ? readFileSync(join(runDir, 'mariadb.err'), 'utf8').slice(-2000) : '';
  child.kill('SIGKILL');
  throw new Error(`MariaDB did not start. Last lines of its log:\n${log}`);
}

function ping(socket: string): boolean {
  try {
    execFileSync(ADMIN, ['--no-defaults', `--socket=${socket}`, '-uroot', 'ping'], { stdio: 'pipe' });
    return true;
  } catch {
    return false;
  }
}

/** A previous run killed hard leaves a server (or its pid file) behind; stop it before starting. */
async function stopStale(socket: string, pidFile: string): Promise<void> {
  if (!ping(socket)) return;
  const pid = existsSync(pidFile) ? Number(readFileSync(pidFile, 'utf8').trim()) : NaN;
  try {
    execFileSync(ADMIN, ['--no-defaults', `--socket=${socket}`, '-uroot', 'shutdown'], { stdio: 'pipe' });
  } catch {
    /* already going */
  }
  for (let i = 0; i < 300 && Number.isFinite(pid); i += 1) {
    try {
      process.kill(pid, 0);
      await sleep(100);
    } catch {
      return;
    }
  }
}

export interface DatabaseAccounts {
  database: string;
  owner: { user: string; password: string };
  app: { user: string; password: string };
}

const sqlString = (value: string) => `'${value.replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;

/**
 * Creates the database and two accounts: the owner runs migrations; the app account gets only
 * data rights (no DDL), so a compromised app cannot change the schema or drop the audit trigger.
 */
export function provisionDatabase(instance: MariadbInstance, accounts: DatabaseAccounts): void {
  const db = `\`${accounts.database.replace(/`/g, '')}\``;
  const host = "'127.0.0.1'";
  instance.rootSql(
    [
      `CREATE DATABASE IF NOT EXISTS ${db} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
      `CREATE USER IF NOT EXISTS ${sqlString(accounts.owner.user)}@${host} IDENTIFIED BY ${sqlString(accounts.owner.password)}`,
      `ALTER USER ${sqlString(accounts.owner.user)}@${host} IDENTIFIED BY ${sqlString(accounts.owner.password)}`,
      `GRANT ALL PRIVILEGES ON ${db}.* TO ${sqlString(accounts.owner.user)}@${host}`,
      `CREATE USER IF NOT EXISTS ${sqlString(accounts.app.user)}@${host} IDENTIFIED BY ${sqlString(accounts.app.password)}`,
      `ALTER USER ${sqlString(accounts.app.user)}@${host} IDENTIFIED BY ${sqlString(accounts.app.password)}`,
      `GRANT SELECT, INSERT, UPDATE, DELETE, LOCK TABLES ON ${db}.* TO ${sqlString(accounts.app.user)}@${host}`,
      'FLUSH PRIVILEGES',
    ].join(';\n'),
  );
}
