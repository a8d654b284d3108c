import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { PaymentMethod, PaymentStatus } from '@app/shared';
import type { MembershipPlan } from './membership-plan.model';
import type { Refund } from './refund.model';
import type { User } from './user.model';

/** One ledger entry for money received (or expected from a checkout). Never deleted; corrections are new rows. */
export class Payment extends Model<InferAttributes<Payment>, InferCreationAttributes<Payment>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare planId: number | null;
  declare method: PaymentMethod;
  declare status: PaymentStatus;
  declare amountMinor: number;
  declare currency: string;
  declare expectedMinor: number | null;
  declare coversFrom: string | null;
  declare coversTo: string | null;
  /** The member's paid-through date before this payment was credited (restored by a full refund). */
  declare priorPaidThrough: CreationOptional<string | null>;
  declare providerSessionId: string | null;
  declare providerPaymentIntentId: string | null;
  declare reference: string | null;
  declare note: string | null;
  declare heldReason: string | null;
  declare recordedById: number | null;
  declare paidAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare user?: NonAttribute<User>;
  declare plan?: NonAttribute<MembershipPlan>;
  declare refunds?: NonAttribute<Refund[]>;
}

/** Registers the model on `sequelize`. */
export function initPayment(sequelize: Sequelize) {
  Payment.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      planId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      method: { type: DataTypes.STRING(10), allowNull: false },
      status: { type: DataTypes.STRING(20), allowNull: false },
      amountMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false },
      expectedMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      coversFrom: { type: DataTypes.DATEONLY, allowNull: true },
      coversTo: { type: DataTypes.DATEONLY, allowNull: true },
      priorPaidThrough: { type: DataTypes.DATEONLY, allowNull: true },
      providerSessionId: { type: DataTypes.STRING(255), allowNull: true, unique: true },
      providerPaymentIntentId: { type: DataTypes.STRING(255), allowNull: true },
      reference: { type: DataTypes.STRING(120), allowNull: true },
      note: { type: DataTypes.STRING(500), allowNull: true },
      heldReason: { type: DataTypes.STRING(300), allowNull: true },
      recordedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      paidAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'payments', underscored: true },
  );
}
