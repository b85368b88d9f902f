import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { StateMapping, SurveyDetail, SurveyEstimate } from '../../shared/schemas';
import type { SurveyFile } from './survey-file';
import type { User } from './user';

export type SurveyKind = SurveyDetail['kind'];
export type SurveyReading = SurveyDetail['reading'];

export class Survey extends Model<InferAttributes<Survey>, InferCreationAttributes<Survey>> {
  declare id: CreationOptional<number>;
  declare studyAreaId: number;
  declare name: string;
  declare notes: CreationOptional<string>;
  declare kind: SurveyKind;
  declare reading: SurveyReading;
  declare mapping: StateMapping;
  declare estimate: SurveyEstimate;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare files?: NonAttribute<SurveyFile[]>;
  declare creator?: NonAttribute<User | null>;
}

export function initSurvey(sequelize: Sequelize): void {
  Survey.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      studyAreaId: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.TEXT, allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      kind: { type: DataTypes.TEXT, allowNull: false },
      reading: { type: DataTypes.JSONB, allowNull: false },
      mapping: { type: DataTypes.JSONB, allowNull: false },
      estimate: { type: DataTypes.JSONB, allowNull: false },
      createdBy: { type: DataTypes.INTEGER, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'surveys', underscored: true },
  );
}
