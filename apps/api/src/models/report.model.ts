import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './user.model';

export type ReportStatus = 'open' | 'dismissed' | 'actioned';

/** A member's report on a post or comment, waiting in the moderators' queue until resolved. */
export class Report extends Model<InferAttributes<Report>, InferCreationAttributes<Report>> {
  declare id: CreationOptional<number>;
  declare reporterId: number;
  declare targetType: 'post' | 'comment';
  declare targetId: number;
  declare reason: string;
  declare status: CreationOptional<ReportStatus>;
  declare resolution: string | null;
  declare resolvedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare reporter?: NonAttribute<User>;
}

export function initReport(sequelize: Sequelize) {
  Report.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      reporterId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      targetType: { type: DataTypes.STRING(10), allowNull: false },
      targetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      reason: { type: DataTypes.STRING(1000), allowNull: false },
      status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'open' },
      resolution: { type: DataTypes.STRING(1000), allowNull: true },
      resolvedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'reports', underscored: true },
  );
}
