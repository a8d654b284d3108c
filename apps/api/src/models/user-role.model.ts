import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Role } from '@app/shared';

export class UserRole extends Model<InferAttributes<UserRole>, InferCreationAttributes<UserRole>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare role: Role;
  declare grantedById: number | null;
  declare createdAt: CreationOptional<Date>;
}

export function initUserRole(sequelize: Sequelize) {
  UserRole.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      role: { type: DataTypes.STRING(20), allowNull: false },
      grantedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'user_roles', underscored: true, updatedAt: false },
  );
}
