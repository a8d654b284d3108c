import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Role, UnitSystem } from '@app/shared';
import type { UserRole } from './user-role.model';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare displayName: string;
  declare passwordHash: string;
  declare emailVerifiedAt: Date | null;
  declare unitSystem: CreationOptional<UnitSystem>;
  /** Opted in to the daily e-mail of unread notices. */
  declare digestOptIn: CreationOptional<boolean>;
  /** The last notice id the digest job has considered for this member (mailed or already read). */
  declare digestThroughId: CreationOptional<number | null>;
  declare digestSentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare roles?: NonAttribute<UserRole[]>;

  get roleNames(): NonAttribute<Role[]> {
    return (this.roles ?? []).map((r) => r.role).sort();
  }
  hasRole(role: Role): boolean {
    return this.roleNames.includes(role);
  }
}

export function initUser(sequelize: Sequelize) {
  User.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      displayName: { type: DataTypes.STRING(80), allowNull: false },
      passwordHash: { type: DataTypes.STRING(100), allowNull: false },
      emailVerifiedAt: { type: DataTypes.DATE, allowNull: true },
      unitSystem: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'imperial' },
      digestOptIn: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      digestThroughId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, defaultValue: null },
      digestSentAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'users', underscored: true },
  );
}
