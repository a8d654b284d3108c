import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { MembershipPlan } from './membership-plan.model';

/** One member's membership: the plan and the last day the dues cover (YYYY-MM-DD, inclusive). */
export class Membership extends Model<
  InferAttributes<Membership>,
  InferCreationAttributes<Membership>
> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare planId: number;
  declare joinedOn: string;
  declare paidThrough: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare plan?: NonAttribute<MembershipPlan>;
}

/** Registers the model on `sequelize`. */
export function initMembership(sequelize: Sequelize) {
  Membership.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, unique: true },
      planId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      joinedOn: { type: DataTypes.DATEONLY, allowNull: false },
      paidThrough: { type: DataTypes.DATEONLY, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'memberships', underscored: true },
  );
}
