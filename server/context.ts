// What request handlers and services share: configuration, database, mailer and logger.
import type { Sequelize } from 'sequelize';
import type { Logger } from 'pino';
import type { Config } from './config';
import type { Mailer } from './mail/mailer';

export type AppContext = {
  config: Config;
  sequelize: Sequelize;
  mailer: Mailer;
  logger: Logger;
};
