import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { PlanComponents, PlanCondition, TacklePlanDto } from '@app/shared';

/** A saved set of ground tackle for one boat and one named condition. */
export class TacklePlan extends Model<
  InferAttributes<TacklePlan>,
  InferCreationAttributes<TacklePlan>
> {
  declare id: CreationOptional<number>;
  declare boatId: number;
  declare ownerId: number;
  declare name: string;
  declare condition: PlanCondition;
  declare windKn: number;
  declare depthM: number;
  declare tideM: number;
  declare bottom: TacklePlanDto['bottom'];
  declare components: PlanComponents;
  declare notes: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initTacklePlan(sequelize: Sequelize) {
  TacklePlan.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      boatId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      condition: { type: DataTypes.STRING(20), allowNull: false },
      windKn: { type: DataTypes.DOUBLE, allowNull: false },
      depthM: { type: DataTypes.DOUBLE, allowNull: false },
      tideM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      bottom: { type: DataTypes.STRING(10), allowNull: true },
      components: { type: DataTypes.JSON, allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'tackle_plans', underscored: true },
  );
}
