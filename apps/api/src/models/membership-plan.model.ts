import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { PlanKind, Proration } from '@app/shared';

/** A dues plan the treasurer defines: an annual amount in minor units, anchored to the club's fiscal year. */
export class MembershipPlan extends Model<
  InferAttributes<MembershipPlan>,
  InferCreationAttributes<MembershipPlan>
> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare name: string;
  declare kind: CreationOptional<PlanKind>;
  declare description: CreationOptional<string>;
  declare amountMinor: number;
  declare currency: string;
  declare proration: Proration;
  declare lateFeeMinor: CreationOptional<number>;
  declare graceDays: CreationOptional<number>;
  declare active: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** Registers the model on `sequelize`. */
export function initMembershipPlan(sequelize: Sequelize) {
  MembershipPlan.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(80), allowNull: false },
      kind: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'individual' },
      description: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
      amountMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false },
      proration: { type: DataTypes.STRING(12), allowNull: false },
      lateFeeMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      graceDays: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 30 },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'membership_plans', underscored: true },
  );
}
