import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Survey } from './survey';

export class ScenarioPhaseRow extends Model<InferAttributes<ScenarioPhaseRow>, InferCreationAttributes<ScenarioPhaseRow>> {
  declare id: CreationOptional<number>;
  declare scenarioId: number;
  declare position: number;
  declare fromStep: number;
  declare toStep: number | null;
  /** Row-stochastic K × K matrix in the scenario's state order. */
  declare matrix: number[][];
  declare surveyId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare survey?: NonAttribute<Survey | null>;
}

export function initScenarioPhase(sequelize: Sequelize): void {
  ScenarioPhaseRow.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      scenarioId: { type: DataTypes.INTEGER, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false },
      fromStep: { type: DataTypes.INTEGER, allowNull: false },
      toStep: { type: DataTypes.INTEGER, allowNull: true },
      matrix: { type: DataTypes.JSONB, allowNull: false },
      surveyId: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'scenario_phases', underscored: true },
  );
}
