import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { ScenarioStartCover } from '../../shared/schemas';
import type { ScenarioPhaseRow } from './scenario-phase';
import type { User } from './user';

export class Scenario extends Model<InferAttributes<Scenario>, InferCreationAttributes<Scenario>> {
  declare id: CreationOptional<number>;
  declare studyAreaId: number;
  declare name: string;
  declare notes: CreationOptional<string>;
  declare yearsPerStep: number;
  declare startCover: ScenarioStartCover;
  /** The study area's state codes, in order, when the matrices were saved. */
  declare stateCodes: string[];
  declare createdBy: number | null;
  declare updatedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare phases?: NonAttribute<ScenarioPhaseRow[]>;
  declare creator?: NonAttribute<User | null>;
  declare updater?: NonAttribute<User | null>;
}

export function initScenario(sequelize: Sequelize): void {
  Scenario.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      studyAreaId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.TEXT, allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      yearsPerStep: { type: DataTypes.DOUBLE, allowNull: false },
      startCover: { type: DataTypes.JSONB, allowNull: false },
      stateCodes: { type: DataTypes.JSONB, allowNull: false },
      createdBy: { type: DataTypes.INTEGER, allowNull: true },
      updatedBy: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'scenarios', underscored: true },
  );
}
