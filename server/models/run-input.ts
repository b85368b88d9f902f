import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { FrozenSpec } from '../services/runs-inputs';

/** The frozen copy of what a run simulates; later edits of the scenario or study area never touch it. */
export class RunInput extends Model<InferAttributes<RunInput>, InferCreationAttributes<RunInput>> {
  declare runId: number;
  declare spec: FrozenSpec;
  /** Float32Array bytes: area of each patch (m²). */
  declare patchAreas: Buffer;
  /** Uint8Array bytes: state of each patch at step 0. */
  declare startStates: Buffer;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initRunInput(sequelize: Sequelize): void {
  RunInput.init(
    {
      runId: { type: DataTypes.INTEGER, primaryKey: true },
      spec: { type: DataTypes.JSONB, allowNull: false },
      patchAreas: { type: DataTypes.BLOB, allowNull: false },
      startStates: { type: DataTypes.BLOB, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'run_inputs', underscored: true },
  );
}
