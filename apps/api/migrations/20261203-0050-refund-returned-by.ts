import { DataTypes, type QueryInterface } from 'sequelize';

// Money a treasurer hands back outside the payment provider (a card payment the provider cannot refund, returned by
// bank transfer, cash or cheque) is a refund row with the way it went back; null for provider and offline refunds.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('refunds', 'returned_by', {
    type: DataTypes.STRING(12),
    allowNull: true,
    defaultValue: null,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('refunds', 'returned_by');
}
