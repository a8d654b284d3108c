import type { CreationAttributes, Transaction } from 'sequelize';
import { Payment } from '../../models';

type PaymentValues = CreationAttributes<Payment>;

/** What every new payment names: who, how, its state and the money. */
type NewPayment = Pick<PaymentValues, 'userId' | 'method' | 'status' | 'amountMinor' | 'currency'> &
  Partial<PaymentValues>;

/** The optional columns of a payment, empty until a caller names them. */
const EMPTY_PAYMENT = {
  planId: null,
  expectedMinor: null,
  coversFrom: null,
  coversTo: null,
  providerSessionId: null,
  providerPaymentIntentId: null,
  reference: null,
  note: null,
  heldReason: null,
  recordedById: null,
  paidAt: null,
} satisfies Partial<PaymentValues>;

/** Writes a payment row (inside `transaction` when given): the columns in `values`, every other one null. */
export const createPayment = (values: NewPayment, transaction?: Transaction) =>
  Payment.create({ ...EMPTY_PAYMENT, ...values }, { transaction });
