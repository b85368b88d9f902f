import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type SurveyFileRole = 'table' | 'earlier' | 'later';

/** An uploaded survey file, kept as sent for provenance. */
export class SurveyFile extends Model<InferAttributes<SurveyFile>, InferCreationAttributes<SurveyFile>> {
  declare id: CreationOptional<number>;
  declare surveyId: number;
  declare role: SurveyFileRole;
  declare fileName: string;
  declare sha256: string;
  declare bytes: Buffer;
  declare size: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initSurveyFile(sequelize: Sequelize): void {
  SurveyFile.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      surveyId: { type: DataTypes.INTEGER, allowNull: false },
      role: { type: DataTypes.TEXT, allowNull: false },
      fileName: { type: DataTypes.TEXT, allowNull: false },
      sha256: { type: DataTypes.TEXT, allowNull: false },
      bytes: { type: DataTypes.BLOB, allowNull: false },
      size: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    {
      sequelize,
      tableName: 'survey_files',
      underscored: true,
      // The bytes are read only for downloads.
      defaultScope: { attributes: { exclude: ['bytes'] } },
      scopes: { withBytes: {} },
    },
  );
}
