import { DataTypes, type QueryInterface } from 'sequelize';
import { fk, id, ts } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('users', {
    id,
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    display_name: { type: DataTypes.STRING(80), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    email_verified_at: { type: DataTypes.DATE, allowNull: true },
    unit_system: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'imperial' },
    created_at: ts,
    updated_at: ts,
  });
  await qi.createTable('user_roles', {
    id,
    user_id: fk('users', 'CASCADE', false),
    role: { type: DataTypes.STRING(20), allowNull: false },
    granted_by_id: fk('users', 'SET NULL', true),
    created_at: ts,
  });
  await qi.addIndex('user_roles', ['user_id', 'role'], {
    unique: true,
    name: 'user_roles_user_role',
  });
  await qi.createTable('email_tokens', {
    id,
    user_id: fk('users', 'CASCADE', false),
    kind: { type: DataTypes.STRING(10), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: ts,
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: ts,
  });
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING(64), primaryKey: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('sessions', ['expires']);
  await qi.addIndex('sessions', ['user_id']);
  await qi.createTable('harbors', {
    id,
    name: { type: DataTypes.STRING(100), allowNull: false },
    slug: { type: DataTypes.STRING(100), allowNull: false, unique: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.createTable('club_settings', {
    key: { type: DataTypes.STRING(64), primaryKey: true },
    value: { type: DataTypes.JSON, allowNull: false },
    updated_at: ts,
  });
  await qi.createTable('outbox_emails', {
    id,
    to_address: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(200), allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: false },
    html_body: { type: DataTypes.TEXT, allowNull: true },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'pending' },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    next_attempt_at: ts,
    locked_until: { type: DataTypes.DATE, allowNull: true },
    last_error: { type: DataTypes.STRING(500), allowNull: true },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('outbox_emails', ['status', 'next_attempt_at']);
  await qi.createTable('audit_events', {
    id,
    actor_id: fk('users', 'SET NULL', true),
    area: { type: DataTypes.STRING(20), allowNull: false },
    action: { type: DataTypes.STRING(60), allowNull: false },
    subject_type: { type: DataTypes.STRING(40), allowNull: false },
    subject_id: { type: DataTypes.STRING(64), allowNull: true },
    reason: { type: DataTypes.STRING(1000), allowNull: true },
    details: { type: DataTypes.JSON, allowNull: true },
    created_at: ts,
  });
  await qi.addIndex('audit_events', ['area', 'created_at']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const t of [
    'audit_events',
    'outbox_emails',
    'club_settings',
    'harbors',
    'sessions',
    'email_tokens',
    'user_roles',
    'users',
  ]) {
    await qi.dropTable(t);
  }
}
