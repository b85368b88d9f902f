// Scenarios with their phases (one matrix each), and surveys with their original files and the
// stored estimate.
import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

const userRef = { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' };

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('surveys', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    study_area_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'study_areas', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.TEXT, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    kind: { type: DataTypes.TEXT, allowNull: false },
    /** How the file(s) were read: columns or attribute, dates, time step, counts of rows. */
    reading: { type: DataTypes.JSONB, allowNull: false },
    /** File label → state code (null: rows left out). */
    mapping: { type: DataTypes.JSONB, allowNull: false },
    /** The estimate as answered by the API (shared/schemas surveyEstimateSchema). */
    estimate: { type: DataTypes.JSONB, allowNull: false },
    created_by: userRef,
    ...timestamps,
  });
  await qi.addIndex('surveys', ['study_area_id']);
  await qi.sequelize.query(`ALTER TABLE surveys ADD CONSTRAINT surveys_kind_check CHECK (kind IN ('plots', 'map-pair'))`);

  await qi.createTable('survey_files', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    survey_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'surveys', key: 'id' }, onDelete: 'CASCADE' },
    role: { type: DataTypes.TEXT, allowNull: false },
    file_name: { type: DataTypes.TEXT, allowNull: false },
    sha256: { type: DataTypes.TEXT, allowNull: false },
    bytes: { type: DataTypes.BLOB, allowNull: false },
    size: { type: DataTypes.INTEGER, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('survey_files', ['survey_id', 'role'], { unique: true });
  await qi.sequelize.query(`ALTER TABLE survey_files ADD CONSTRAINT survey_files_role_check CHECK (role IN ('table', 'earlier', 'later'))`);

  await qi.createTable('scenarios', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    study_area_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'study_areas', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.TEXT, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    years_per_step: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 1 },
    start_cover: { type: DataTypes.JSONB, allowNull: false },
    /** The study area's state codes, in order, when the matrices were saved. */
    state_codes: { type: DataTypes.JSONB, allowNull: false },
    created_by: userRef,
    updated_by: userRef,
    ...timestamps,
  });
  await qi.addIndex('scenarios', ['study_area_id']);

  await qi.createTable('scenario_phases', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    scenario_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'scenarios', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false },
    from_step: { type: DataTypes.INTEGER, allowNull: false },
    to_step: { type: DataTypes.INTEGER, allowNull: true },
    /** Row-stochastic K × K matrix, rows and columns in state_codes order. */
    matrix: { type: DataTypes.JSONB, allowNull: false },
    survey_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'surveys', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  });
  await qi.addIndex('scenario_phases', ['scenario_id', 'position'], { unique: true });
  await qi.addIndex('scenario_phases', ['survey_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('scenario_phases');
  await qi.dropTable('scenarios');
  await qi.dropTable('survey_files');
  await qi.dropTable('surveys');
}
