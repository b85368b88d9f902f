import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare actorId: number | null;
  declare actorName: string;
  declare action: string;
  declare summary: string;
  declare createdAt: CreationOptional<Date>;
}

export function initAuditEvent(sequelize: Sequelize): void {
  AuditEvent.init(
    {
      id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false },
      actorId: { type: DataTypes.INTEGER, allowNull: true },
      actorName: { type: DataTypes.TEXT, allowNull: false },
      action: { type: DataTypes.TEXT, allowNull: false },
      summary: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'audit_events', underscored: true, updatedAt: false },
  );
}
