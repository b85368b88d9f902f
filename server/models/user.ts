import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { AreaUnit, User as UserView } from '../../shared/schemas';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare areaUnit: CreationOptional<AreaUnit>;
  declare emailVerifiedAt: Date | null;
  declare isAdmin: CreationOptional<boolean>;
  declare disabledAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  /** What the API shows of an account (never the password hash). */
  toView(): UserView {
    return {
      id: this.id,
      email: this.email,
      name: this.name,
      areaUnit: this.areaUnit,
      emailVerified: this.emailVerifiedAt !== null,
      isAdmin: this.isAdmin,
    };
  }
}

export function initUser(sequelize: Sequelize): void {
  User.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      email: { type: DataTypes.TEXT, allowNull: false, unique: true },
      name: { type: DataTypes.TEXT, allowNull: false },
      passwordHash: { type: DataTypes.TEXT, allowNull: false },
      areaUnit: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'ha' },
      emailVerifiedAt: { type: DataTypes.DATE, allowNull: true },
      isAdmin: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      disabledAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'users', underscored: true },
  );
}
