import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Deflated patch states of the shown replicate for one chunk of FRAME_CHUNK_STEPS steps. */
export class RunFrame extends Model<InferAttributes<RunFrame>, InferCreationAttributes<RunFrame>> {
  declare runId: number;
  declare chunkIndex: number;
  declare bytes: Buffer;
}

export function initRunFrame(sequelize: Sequelize): void {
  RunFrame.init(
    {
      runId: { type: DataTypes.INTEGER, primaryKey: true },
      chunkIndex: { type: DataTypes.INTEGER, primaryKey: true },
      bytes: { type: DataTypes.BLOB, allowNull: false },
    },
    { sequelize, tableName: 'run_frames', underscored: true, timestamps: false },
  );
}
