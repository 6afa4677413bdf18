import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';

import type { Env } from './config/env';
import type { FileStorage } from './services/file-storage.service';
import type { Mailer } from './services/mail.service';

export interface Clock {
  now(): Date;
}

export const systemClock: Clock = { now: () => new Date() };

/** Everything a request needs from the outside world, handed to createApp (tests swap parts). */
export interface AppContext {
  env: Env;
  sequelize: Sequelize;
  logger: Logger;
  mailer: Mailer;
  storage: FileStorage;
  clock: Clock;
}
