import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type StartCoverMethod = 'random' | 'exact' | 'cover-map';

export class StartCover extends Model<InferAttributes<StartCover>, InferCreationAttributes<StartCover>> {
  declare studyAreaId: number;
  declare method: StartCoverMethod;
  declare proportions: number[] | null;
  declare seed: string | null;
  /** Uint8Array bytes: the state position of each patch at step 0. */
  declare states: Buffer;
  declare unmatchedCount: CreationOptional<number>;
  declare mapping: Record<string, string> | null;
  declare sourceName: string | null;
  declare sourceSha256: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initStartCover(sequelize: Sequelize): void {
  StartCover.init(
    {
      studyAreaId: { type: DataTypes.INTEGER, primaryKey: true },
      method: { type: DataTypes.TEXT, allowNull: false },
      proportions: { type: DataTypes.JSONB, allowNull: true },
      seed: { type: DataTypes.TEXT, allowNull: true },
      states: { type: DataTypes.BLOB, allowNull: false },
      unmatchedCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      mapping: { type: DataTypes.JSONB, allowNull: true },
      sourceName: { type: DataTypes.TEXT, allowNull: true },
      sourceSha256: { type: DataTypes.TEXT, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'start_covers', underscored: true },
  );
}
