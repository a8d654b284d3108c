import { DataTypes, type QueryInterface } from 'sequelize';

// A moderator's decision (publish, send back, decline, a report resolved, a listing hidden) with what it changed,
// so it can be undone for a short while: the changed columns of each row before and after, and the notices and
// e-mails it queued, which an undo withdraws or follows with a correction.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('moderation_decisions', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    actor_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    area: { type: DataTypes.STRING(20), allowNull: false },
    action: { type: DataTypes.STRING(60), allowNull: false },
    subject_type: { type: DataTypes.STRING(20), allowNull: false },
    subject_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    title: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    changes: { type: DataTypes.JSON, allowNull: false },
    notices: { type: DataTypes.JSON, allowNull: false },
    undone_at: { type: DataTypes.DATE, allowNull: true },
    undone_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('moderation_decisions', ['subject_type', 'subject_id'], {
    name: 'moderation_decisions_subject',
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('moderation_decisions');
}
