// Study areas with their boundary, patch grid (stored compactly as binary arrays), cover states
// and start cover.
import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('study_areas', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.TEXT, allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    source_name: { type: DataTypes.TEXT, allowNull: false },
    source_format: { type: DataTypes.TEXT, allowNull: false },
    source_sha256: { type: DataTypes.TEXT, allowNull: false },
    source_bytes: { type: DataTypes.BLOB, allowNull: false },
    source_size: { type: DataTypes.INTEGER, allowNull: false },
    boundary: { type: DataTypes.JSONB, allowNull: false },
    boundary_area_m2: { type: DataTypes.DOUBLE, allowNull: false },
    cell_size_m: { type: DataTypes.DOUBLE, allowNull: false },
    min_fraction: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    grid_spec: { type: DataTypes.JSONB, allowNull: false },
    patch_count: { type: DataTypes.INTEGER, allowNull: false },
    patch_cells: { type: DataTypes.BLOB, allowNull: false },
    patch_areas: { type: DataTypes.BLOB, allowNull: false },
    total_area_m2: { type: DataTypes.DOUBLE, allowNull: false },
    created_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  });
  await qi.addIndex('study_areas', ['team_id']);

  await qi.createTable('cover_states', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    study_area_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'study_areas', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false },
    code: { type: DataTypes.TEXT, allowNull: false },
    name: { type: DataTypes.TEXT, allowNull: false },
    colour: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('cover_states', ['study_area_id', 'position'], { unique: true });

  await qi.createTable('start_covers', {
    study_area_id: { type: DataTypes.INTEGER, primaryKey: true, references: { model: 'study_areas', key: 'id' }, onDelete: 'CASCADE' },
    method: { type: DataTypes.TEXT, allowNull: false },
    proportions: { type: DataTypes.JSONB, allowNull: true },
    seed: { type: DataTypes.TEXT, allowNull: true },
    /** Uint8Array bytes: the state position of each patch at step 0. */
    states: { type: DataTypes.BLOB, allowNull: false },
    unmatched_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    mapping: { type: DataTypes.JSONB, allowNull: true },
    source_name: { type: DataTypes.TEXT, allowNull: true },
    source_sha256: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.sequelize.query(`ALTER TABLE start_covers ADD CONSTRAINT start_covers_method_check CHECK (method IN ('random', 'exact', 'cover-map'))`);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('start_covers');
  await qi.dropTable('cover_states');
  await qi.dropTable('study_areas');
}
