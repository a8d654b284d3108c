import { DataTypes, type QueryInterface } from 'sequelize';
import { fk, id, ts } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('listings', {
    id,
    seller_id: fk('users', 'CASCADE', false),
    category: { type: DataTypes.STRING(12), allowNull: false },
    title: { type: DataTypes.STRING(100), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false },
    specs: { type: DataTypes.JSON, allowNull: false },
    condition: { type: DataTypes.STRING(12), allowNull: false },
    price_cents: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    currency: { type: DataTypes.CHAR(3), allowNull: false },
    harbor_id: fk('harbors', 'RESTRICT', false),
    status: { type: DataTypes.STRING(10), allowNull: false },
    size_mm: { type: DataTypes.DOUBLE, allowNull: true },
    published_at: { type: DataTypes.DATE, allowNull: true },
    expires_at: { type: DataTypes.DATE, allowNull: true },
    sold_at: { type: DataTypes.DATE, allowNull: true },
    sold_thread_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    hidden_at: { type: DataTypes.DATE, allowNull: true },
    hidden_reason: { type: DataTypes.STRING(1000), allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('listings', ['status', 'expires_at']);
  await qi.addIndex('listings', ['seller_id', 'status']);
  await qi.addIndex('listings', ['updated_at']);

  await qi.createTable('listing_photos', {
    id,
    listing_id: fk('listings', 'CASCADE', false),
    storage_key: { type: DataTypes.STRING(200), allowNull: false },
    thumb_key: { type: DataTypes.STRING(200), allowNull: false },
    width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    position: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('listing_photos', ['listing_id', 'position']);

  await qi.createTable('listing_threads', {
    id,
    listing_id: fk('listings', 'CASCADE', false),
    buyer_id: fk('users', 'CASCADE', false),
    seller_id: fk('users', 'CASCADE', false),
    // Millisecond precision: unread counts compare message times with read marks.
    last_message_at: { type: DataTypes.DATE(3), allowNull: false },
    buyer_read_at: { type: DataTypes.DATE(3), allowNull: true },
    seller_read_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('listing_threads', ['listing_id', 'buyer_id'], { unique: true });
  await qi.addIndex('listing_threads', ['seller_id', 'last_message_at']);
  await qi.addIndex('listing_threads', ['buyer_id', 'last_message_at']);

  await qi.createTable('listing_messages', {
    id,
    thread_id: fk('listing_threads', 'CASCADE', false),
    sender_id: fk('users', 'CASCADE', false),
    body: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: ts,
  });
  await qi.addIndex('listing_messages', ['thread_id', 'created_at']);

  await qi.createTable('saved_searches', {
    id,
    user_id: fk('users', 'CASCADE', false),
    name: { type: DataTypes.STRING(80), allowNull: false },
    criteria: { type: DataTypes.JSON, allowNull: false },
    created_at: ts,
    updated_at: ts,
  });
  await qi.createTable('saved_search_hits', {
    id,
    saved_search_id: fk('saved_searches', 'CASCADE', false),
    listing_id: fk('listings', 'CASCADE', false),
    created_at: ts,
  });
  await qi.addIndex('saved_search_hits', ['saved_search_id', 'listing_id'], { unique: true });

  await qi.createTable('listing_reports', {
    id,
    listing_id: fk('listings', 'CASCADE', false),
    reporter_id: fk('users', 'CASCADE', false),
    reason: { type: DataTypes.STRING(1000), allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('listing_reports', ['listing_id', 'reporter_id'], { unique: true });
  await qi.addIndex('listing_reports', ['status']);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('listing_reports');
  await qi.dropTable('saved_search_hits');
  await qi.dropTable('saved_searches');
  await qi.dropTable('listing_messages');
  await qi.dropTable('listing_threads');
  await qi.dropTable('listing_photos');
  await qi.dropTable('listings');
}
