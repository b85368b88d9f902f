import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { RunSummary } from '../../shared/schemas';

/** Merged results of a finished run. */
export class RunResultRow extends Model<InferAttributes<RunResultRow>, InferCreationAttributes<RunResultRow>> {
  declare runId: number;
  /** Float64Array bytes: area (m²) per [replicate][step][state]. */
  declare area: Buffer;
  /** Float64Array bytes: patch counts, same layout. */
  declare counts: Buffer;
  declare summary: RunSummary;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initRunResult(sequelize: Sequelize): void {
  RunResultRow.init(
    {
      runId: { type: DataTypes.INTEGER, primaryKey: true },
      area: { type: DataTypes.BLOB, allowNull: false },
      counts: { type: DataTypes.BLOB, allowNull: false },
      summary: { type: DataTypes.JSONB, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'run_results', underscored: true },
  );
}
