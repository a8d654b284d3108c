import { DataTypes, type QueryInterface } from 'sequelize';
import { fk, id, ts } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('membership_plans', {
    id,
    code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(80), allowNull: false },
    description: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    amount_minor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    currency: { type: DataTypes.CHAR(3), allowNull: false },
    proration: { type: DataTypes.STRING(12), allowNull: false },
    late_fee_minor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    grace_days: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 30 },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.createTable('memberships', {
    id,
    user_id: { ...fk('users', 'CASCADE', false), unique: true },
    plan_id: fk('membership_plans', 'RESTRICT', false),
    joined_on: { type: DataTypes.DATEONLY, allowNull: false },
    paid_through: { type: DataTypes.DATEONLY, allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.createTable('payments', {
    id,
    user_id: fk('users', 'RESTRICT', false),
    plan_id: fk('membership_plans', 'RESTRICT', true),
    method: { type: DataTypes.STRING(10), allowNull: false },
    status: { type: DataTypes.STRING(20), allowNull: false },
    amount_minor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    currency: { type: DataTypes.CHAR(3), allowNull: false },
    expected_minor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    covers_from: { type: DataTypes.DATEONLY, allowNull: true },
    covers_to: { type: DataTypes.DATEONLY, allowNull: true },
    prior_paid_through: { type: DataTypes.DATEONLY, allowNull: true },
    provider_session_id: { type: DataTypes.STRING(255), allowNull: true, unique: true },
    provider_payment_intent_id: { type: DataTypes.STRING(255), allowNull: true },
    reference: { type: DataTypes.STRING(120), allowNull: true },
    note: { type: DataTypes.STRING(500), allowNull: true },
    held_reason: { type: DataTypes.STRING(300), allowNull: true },
    recorded_by_id: fk('users', 'SET NULL', true),
    paid_at: { type: DataTypes.DATE, allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('payments', ['user_id']);
  await qi.addIndex('payments', ['status']);
  await qi.createTable('refunds', {
    id,
    payment_id: fk('payments', 'RESTRICT', false),
    amount_minor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    currency: { type: DataTypes.CHAR(3), allowNull: false },
    status: { type: DataTypes.STRING(12), allowNull: false },
    provider_refund_id: { type: DataTypes.STRING(255), allowNull: true, unique: true },
    reason: { type: DataTypes.STRING(500), allowNull: false },
    requested_by_id: fk('users', 'SET NULL', true),
    completed_at: { type: DataTypes.DATE, allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.createTable('provider_events', {
    id,
    event_id: { type: DataTypes.STRING(255), allowNull: false, unique: true },
    type: { type: DataTypes.STRING(80), allowNull: false },
    outcome: { type: DataTypes.STRING(40), allowNull: false },
    created_at: ts,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('provider_events');
  await qi.dropTable('refunds');
  await qi.dropTable('payments');
  await qi.dropTable('memberships');
  await qi.dropTable('membership_plans');
}
