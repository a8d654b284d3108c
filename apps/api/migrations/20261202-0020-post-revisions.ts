import { DataTypes, type QueryInterface } from 'sequelize';

// An edit to a published post that changes more than a little text waits for a moderator as a revision while
// readers keep seeing the published version. approved_title keeps the title as last approved, so small edits
// are measured against what a moderator actually read.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('posts', 'revision', { type: DataTypes.JSON, allowNull: true });
  await qi.addColumn('posts', 'revision_status', { type: DataTypes.STRING(20), allowNull: true });
  await qi.addColumn('posts', 'approved_title', { type: DataTypes.STRING(160), allowNull: true });
  await qi.addIndex('posts', ['revision_status'], { name: 'posts_revision_status' });
  await qi.sequelize.query(
    "UPDATE posts SET approved_title = title WHERE status = 'approved' AND approved_title IS NULL",
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex('posts', 'posts_revision_status');
  await qi.removeColumn('posts', 'approved_title');
  await qi.removeColumn('posts', 'revision_status');
  await qi.removeColumn('posts', 'revision');
}
