import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { RunInputsSummary, RunStatus } from '../../shared/schemas';
import type { User } from './user';

export class Run extends Model<InferAttributes<Run>, InferCreationAttributes<Run>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare studyAreaId: number;
  declare scenarioId: number | null;
  declare createdBy: number | null;
  declare status: RunStatus;
  declare steps: number;
  declare yearsPerStep: number;
  declare replicates: number;
  declare seed: string;
  declare shownReplicate: number;
  declare fingerprint: string;
  declare inputsSummary: RunInputsSummary;
  declare shardsPerReplicate: number;
  declare shardCount: number;
  declare shardsDone: CreationOptional<number>;
  declare attempt: CreationOptional<number>;
  declare error: string | null;
  declare startedAt: Date | null;
  declare finishedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare creator?: NonAttribute<User | null>;
}

export function initRun(sequelize: Sequelize): void {
  Run.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false },
      studyAreaId: { type: DataTypes.INTEGER, allowNull: false },
      scenarioId: { type: DataTypes.INTEGER, allowNull: true },
      createdBy: { type: DataTypes.INTEGER, allowNull: true },
      status: { type: DataTypes.TEXT, allowNull: false },
      steps: { type: DataTypes.INTEGER, allowNull: false },
      yearsPerStep: { type: DataTypes.DOUBLE, allowNull: false },
      replicates: { type: DataTypes.INTEGER, allowNull: false },
      seed: { type: DataTypes.TEXT, allowNull: false },
      shownReplicate: { type: DataTypes.INTEGER, allowNull: false },
      fingerprint: { type: DataTypes.TEXT, allowNull: false },
      inputsSummary: { type: DataTypes.JSONB, allowNull: false },
      shardsPerReplicate: { type: DataTypes.INTEGER, allowNull: false },
      shardCount: { type: DataTypes.INTEGER, allowNull: false },
      shardsDone: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      attempt: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      error: { type: DataTypes.TEXT, allowNull: true },
      startedAt: { type: DataTypes.DATE, allowNull: true },
      finishedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'runs', underscored: true },
  );
}
