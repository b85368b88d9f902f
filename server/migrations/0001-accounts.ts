// Accounts, teams, memberships, invitations, single-use account tokens and the session table.
import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.TEXT, allowNull: false, unique: true },
    name: { type: DataTypes.TEXT, allowNull: false },
    password_hash: { type: DataTypes.TEXT, allowNull: false },
    area_unit: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'ha' },
    email_verified_at: { type: DataTypes.DATE, allowNull: true },
    is_admin: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    disabled_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.sequelize.query(`ALTER TABLE users ADD CONSTRAINT users_area_unit_check CHECK (area_unit IN ('ha', 'acres'))`);

  await qi.createTable('teams', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });

  await qi.createTable('memberships', {
    team_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    role: { type: DataTypes.TEXT, allowNull: false },
    notify_runs: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    ...timestamps,
  });
  await qi.sequelize.query(`ALTER TABLE memberships ADD CONSTRAINT memberships_role_check CHECK (role IN ('owner', 'editor', 'viewer'))`);
  await qi.addIndex('memberships', ['user_id']);

  await qi.createTable('invitations', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    email: { type: DataTypes.TEXT, allowNull: false },
    role: { type: DataTypes.TEXT, allowNull: false },
    token_hash: { type: DataTypes.TEXT, allowNull: false, unique: true },
    invited_by: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.sequelize.query(`ALTER TABLE invitations ADD CONSTRAINT invitations_role_check CHECK (role IN ('owner', 'editor', 'viewer'))`);
  await qi.addIndex('invitations', ['team_id']);

  await qi.createTable('account_tokens', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    purpose: { type: DataTypes.TEXT, allowNull: false },
    token_hash: { type: DataTypes.TEXT, allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.sequelize.query(`ALTER TABLE account_tokens ADD CONSTRAINT account_tokens_purpose_check CHECK (purpose IN ('verify', 'reset'))`);

  // The table connect-pg-simple expects (its table.sql), created here so the app never creates tables itself.
  await qi.sequelize.query(`
    CREATE TABLE "session" (
      "sid" varchar NOT NULL COLLATE "default" PRIMARY KEY,
      "sess" json NOT NULL,
      "expire" timestamp(6) NOT NULL
    );
    CREATE INDEX "IDX_session_expire" ON "session" ("expire");
  `);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('session');
  await qi.dropTable('account_tokens');
  await qi.dropTable('invitations');
  await qi.dropTable('memberships');
  await qi.dropTable('teams');
  await qi.dropTable('users');
}
