import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class CoverStateRow extends Model<InferAttributes<CoverStateRow>, InferCreationAttributes<CoverStateRow>> {
  declare id: CreationOptional<number>;
  declare studyAreaId: number;
  declare position: number;
  declare code: string;
  declare name: string;
  declare colour: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCoverState(sequelize: Sequelize): void {
  CoverStateRow.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      studyAreaId: { type: DataTypes.INTEGER, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false },
      code: { type: DataTypes.TEXT, allowNull: false },
      name: { type: DataTypes.TEXT, allowNull: false },
      colour: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'cover_states', underscored: true },
  );
}
