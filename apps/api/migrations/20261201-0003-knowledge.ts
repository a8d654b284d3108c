import { DataTypes, type QueryInterface } from 'sequelize';
import { STARTING_TOPICS } from '../src/modules/topics/starting-topics';
import { fk, id, ts } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('topics', {
    id,
    slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(60), allowNull: false },
    description: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 100 },
    created_at: ts,
    updated_at: ts,
  });
  const now = new Date();
  await qi.bulkInsert(
    'topics',
    STARTING_TOPICS.map(([slug, name, description], i) => ({
      slug,
      name,
      description,
      position: (i + 1) * 10,
      created_at: now,
      updated_at: now,
    })),
  );
  await qi.createTable('posts', {
    id,
    author_id: fk('users', 'CASCADE', false),
    topic_id: fk('topics', 'SET NULL', true),
    boat_id: fk('boats', 'SET NULL', true),
    kind: { type: DataTypes.STRING(12), allowNull: false },
    title: { type: DataTypes.STRING(160), allowNull: false },
    body_json: { type: DataTypes.JSON, allowNull: false },
    body_html: { type: DataTypes.TEXT('medium'), allowNull: false },
    body_text: { type: DataTypes.TEXT('medium'), allowNull: false },
    approved_text: { type: DataTypes.TEXT('medium'), allowNull: true },
    status: { type: DataTypes.STRING(20), allowNull: false },
    visibility: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'public' },
    setup: { type: DataTypes.JSON, allowNull: true },
    moderation_note: { type: DataTypes.STRING(1000), allowNull: true },
    accepted_comment_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    helpful_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    pinned_at: { type: DataTypes.DATE, allowNull: true },
    locked_at: { type: DataTypes.DATE, allowNull: true },
    published_at: { type: DataTypes.DATE, allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('posts', ['status', 'published_at']);
  await qi.addIndex('posts', ['author_id', 'updated_at']);
  await qi.addIndex('posts', ['updated_at']);
  await qi.createTable('comments', {
    id,
    post_id: fk('posts', 'CASCADE', false),
    author_id: fk('users', 'CASCADE', false),
    parent_id: fk('comments', 'CASCADE', true),
    body: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.STRING(12), allowNull: false },
    moderation_note: { type: DataTypes.STRING(1000), allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('comments', ['post_id', 'status']);
  await qi.addIndex('comments', ['status']);
  await qi.createTable('votes', {
    id,
    post_id: fk('posts', 'CASCADE', false),
    user_id: fk('users', 'CASCADE', false),
    created_at: ts,
  });
  await qi.addIndex('votes', ['post_id', 'user_id'], { unique: true });
  await qi.createTable('reports', {
    id,
    reporter_id: fk('users', 'CASCADE', false),
    target_type: { type: DataTypes.STRING(10), allowNull: false },
    target_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    reason: { type: DataTypes.STRING(1000), allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'open' },
    resolution: { type: DataTypes.STRING(1000), allowNull: true },
    resolved_by_id: fk('users', 'SET NULL', true),
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('reports', ['status']);
  await qi.addIndex('reports', ['target_type', 'target_id']);
  await qi.createTable('notifications', {
    id,
    user_id: fk('users', 'CASCADE', false),
    kind: { type: DataTypes.STRING(30), allowNull: false },
    message: { type: DataTypes.STRING(300), allowNull: false },
    link: { type: DataTypes.STRING(300), allowNull: true },
    read_at: { type: DataTypes.DATE, allowNull: true },
    created_at: ts,
  });
  await qi.addIndex('notifications', ['user_id', 'read_at']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('notifications');
  await qi.dropTable('reports');
  await qi.dropTable('votes');
  await qi.dropTable('comments');
  await qi.dropTable('posts');
  await qi.dropTable('topics');
}
