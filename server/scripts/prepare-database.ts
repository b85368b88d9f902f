// Creates the database if needed, applies migrations and (optionally) the demo seed.
import { connectDatabase } from '../db';
import { migrateUp } from '../migrate';
import { seedDemo } from '../seed/demo';
import { ensureDatabase } from './postgres';

export async function prepareDatabase(databaseUrl: string, options: { seed: boolean }): Promise<string[]> {
  await ensureDatabase(databaseUrl);
  const sequelize = connectDatabase(databaseUrl);
  try {
    const applied = await migrateUp(sequelize);
    if (options.seed) await seedDemo(sequelize);
    return applied;
  } finally {
    await sequelize.close();
  }
}
