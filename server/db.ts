// One Sequelize instance per process (or per test database).
import { Sequelize } from 'sequelize';
import pg from 'pg';
import { initModels } from './models';

export function connectDatabase(databaseUrl: string): Sequelize {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    pool: { max: 10, idle: 10_000 },
  });
  initModels(sequelize);
  return sequelize;
}
