// Runs: their frozen inputs, shard results (keyed by run, attempt and shard so that a shard
// delivered twice is written once), merged results, the shown replicate's patch states in
// compressed chunks of steps, and in-app notices.
import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

const runRef = { type: DataTypes.INTEGER, allowNull: false, references: { model: 'runs', key: 'id' }, onDelete: 'CASCADE' };

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('runs', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    study_area_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'study_areas', key: 'id' }, onDelete: 'CASCADE' },
    scenario_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'scenarios', key: 'id' }, onDelete: 'SET NULL' },
    created_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    status: { type: DataTypes.TEXT, allowNull: false },
    steps: { type: DataTypes.INTEGER, allowNull: false },
    years_per_step: { type: DataTypes.DOUBLE, allowNull: false },
    replicates: { type: DataTypes.INTEGER, allowNull: false },
    seed: { type: DataTypes.TEXT, allowNull: false },
    shown_replicate: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    fingerprint: { type: DataTypes.TEXT, allowNull: false },
    inputs_summary: { type: DataTypes.JSONB, allowNull: false },
    shards_per_replicate: { type: DataTypes.INTEGER, allowNull: false },
    shard_count: { type: DataTypes.INTEGER, allowNull: false },
    shards_done: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    /** Incremented by retry; shard rows and jobs of older attempts are ignored. */
    attempt: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    error: { type: DataTypes.TEXT, allowNull: true },
    started_at: { type: DataTypes.DATE, allowNull: true },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('runs', ['study_area_id', 'created_at']);
  await qi.addIndex('runs', ['team_id', 'status']);
  await qi.sequelize.query(`ALTER TABLE runs ADD CONSTRAINT runs_status_check CHECK (status IN ('queued', 'running', 'merging', 'succeeded', 'failed', 'cancelled'))`);

  await qi.createTable('run_inputs', {
    run_id: { ...runRef, primaryKey: true },
    /** Grid spec, states, phases with matrices and the start-cover description (canonical JSON). */
    spec: { type: DataTypes.JSONB, allowNull: false },
    /** Float32Array bytes: area of each patch (m²). */
    patch_areas: { type: DataTypes.BLOB, allowNull: false },
    /** Uint8Array bytes: state of each patch at step 0. */
    start_states: { type: DataTypes.BLOB, allowNull: false },
    ...timestamps,
  });

  await qi.createTable('run_shards', {
    run_id: { ...runRef, primaryKey: true },
    attempt: { type: DataTypes.INTEGER, primaryKey: true },
    shard_index: { type: DataTypes.INTEGER, primaryKey: true },
    replicate: { type: DataTypes.INTEGER, allowNull: false },
    patch_start: { type: DataTypes.INTEGER, allowNull: false },
    patch_end: { type: DataTypes.INTEGER, allowNull: false },
    /** Float64Array bytes of the kernel's ShardResult.counts and .areaByBlock. */
    counts: { type: DataTypes.BLOB, allowNull: false },
    area_by_block: { type: DataTypes.BLOB, allowNull: false },
    ...timestamps,
  });

  await qi.createTable('run_shard_frames', {
    run_id: { ...runRef, primaryKey: true },
    attempt: { type: DataTypes.INTEGER, primaryKey: true },
    shard_index: { type: DataTypes.INTEGER, primaryKey: true },
    chunk_index: { type: DataTypes.INTEGER, primaryKey: true },
    /** Deflated states of the shard's patches for the chunk's steps, step-major. */
    bytes: { type: DataTypes.BLOB, allowNull: false },
  });

  await qi.createTable('run_results', {
    run_id: { ...runRef, primaryKey: true },
    /** Float64Array bytes: area (m²) per [replicate][step][state]. */
    area: { type: DataTypes.BLOB, allowNull: false },
    /** Float64Array bytes: patch counts, same layout. */
    counts: { type: DataTypes.BLOB, allowNull: false },
    /** The per-step summary as answered by GET /runs/:id/summary. */
    summary: { type: DataTypes.JSONB, allowNull: false },
    ...timestamps,
  });

  await qi.createTable('run_frames', {
    run_id: { ...runRef, primaryKey: true },
    chunk_index: { type: DataTypes.INTEGER, primaryKey: true },
    /** Deflated states of every patch of the shown replicate for FRAME_CHUNK_STEPS steps, step-major. */
    bytes: { type: DataTypes.BLOB, allowNull: false },
  });

  await qi.createTable('notices', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    run_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'runs', key: 'id' }, onDelete: 'CASCADE' },
    message: { type: DataTypes.TEXT, allowNull: false },
    link: { type: DataTypes.TEXT, allowNull: true },
    read_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('notices', ['user_id', 'created_at']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const table of ['notices', 'run_frames', 'run_results', 'run_shard_frames', 'run_shards', 'run_inputs', 'runs']) await qi.dropTable(table);
}
