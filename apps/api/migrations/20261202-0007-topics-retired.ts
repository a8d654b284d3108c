import { DataTypes, type QueryInterface } from 'sequelize';

// Admins retire a topic instead of deleting it when posts are filed under it: the posts keep their topic,
// new posts can no longer choose it.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('topics', 'retired_at', { type: DataTypes.DATE, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('topics', 'retired_at');
}
