import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { OfflineMethod, RefundStatus } from '@app/shared';
import type { Payment } from './payment.model';

/** Money returned against a payment; its status follows the provider's webhook for card payments. */
export class Refund extends Model<InferAttributes<Refund>, InferCreationAttributes<Refund>> {
  declare id: CreationOptional<number>;
  declare paymentId: number;
  declare amountMinor: number;
  declare currency: string;
  declare status: RefundStatus;
  declare providerRefundId: string | null;
  declare reason: string;
  declare requestedById: number | null;
  declare completedAt: Date | null;
  /** Set when the money went back outside the payment provider (by the treasurer: transfer, cash or cheque). */
  declare returnedBy: CreationOptional<OfflineMethod | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare payment?: NonAttribute<Payment>;
}

/** Registers the model on `sequelize`. */
export function initRefund(sequelize: Sequelize) {
  Refund.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      paymentId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      amountMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false },
      status: { type: DataTypes.STRING(12), allowNull: false },
      providerRefundId: { type: DataTypes.STRING(255), allowNull: true, unique: true },
      reason: { type: DataTypes.STRING(500), allowNull: false },
      requestedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      completedAt: { type: DataTypes.DATE, allowNull: true },
      returnedBy: { type: DataTypes.STRING(12), allowNull: true, defaultValue: null },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'refunds', underscored: true },
  );
}
