// Where a link token (reset, invitation) is kept in the database: only as its SHA-256 digest
// (FIPS 180-4; computed here by node:crypto) in its own table, and nowhere in plain text: not
// there, and not in pg-boss's job or archive tables, which held the mail that carried it.
import { createHash } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';

const MAIL_JOB_TABLES = ['pgboss.job', 'pgboss.archive'];

async function rowsOf(sequelize: Sequelize, table: string): Promise<string[]> {
  const rows = await sequelize.query<{ row: string }>(`SELECT t::text AS row FROM ${table} t`, { type: QueryTypes.SELECT });
  return rows.map((r) => r.row);
}

export async function storedForms(sequelize: Sequelize, table: string, token: string): Promise<{ digestInTable: boolean; plainAnywhere: string[] }> {
  const digest = createHash('sha256').update(token).digest('hex');
  const rows = await Promise.all([table, ...MAIL_JOB_TABLES].map(async (name) => ({ name, rows: await rowsOf(sequelize, name) })));
  return {
    digestInTable: rows[0].rows.some((row) => row.includes(digest)),
    plainAnywhere: rows.filter((t) => t.rows.some((row) => row.includes(token))).map((t) => t.name),
  };
}
