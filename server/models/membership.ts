import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Role } from '../../shared/schemas';
import type { User } from './user';
import type { Team } from './team';

export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare teamId: number;
  declare userId: number;
  declare role: Role;
  declare notifyRuns: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare user?: NonAttribute<User>;
  declare team?: NonAttribute<Team>;
}

export function initMembership(sequelize: Sequelize): void {
  Membership.init(
    {
      teamId: { type: DataTypes.INTEGER, primaryKey: true },
      userId: { type: DataTypes.INTEGER, primaryKey: true },
      role: { type: DataTypes.TEXT, allowNull: false },
      notifyRuns: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'memberships', underscored: true },
  );
}
