// Runs pending migrations with umzug, recording them in the SequelizeMeta table.
import type { Sequelize } from 'sequelize';
import { Umzug, SequelizeStorage } from 'umzug';
import { migrations } from './migrations';

export function migrator(sequelize: Sequelize): Umzug<ReturnType<Sequelize['getQueryInterface']>> {
  const context = sequelize.getQueryInterface();
  return new Umzug({
    migrations: migrations.map((m) => ({
      name: m.name,
      up: () => m.up({ context }),
      down: () => m.down({ context }),
    })),
    context,
    storage: new SequelizeStorage({ sequelize }),
    logger: undefined,
  });
}

/** Applies every pending migration; returns the names applied. */
export async function migrateUp(sequelize: Sequelize): Promise<string[]> {
  const applied = await migrator(sequelize).up();
  return applied.map((m) => m.name);
}
