import { DataTypes, type QueryInterface } from 'sequelize';
import { fk, id, ts } from './columns';

// A storm watch: the club's forecast for one named storm or gale, the harbours it affects and the checklist
// as it stood when the watch opened (later template edits leave a running watch alone). One readiness row per
// boat that its owner (or a moderator assigning a buddy) has touched; a boat without a row is "not started".
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('storm_watches', {
    id,
    name: { type: DataTypes.STRING(80), allowNull: false },
    sustained_kn: { type: DataTypes.DOUBLE, allowNull: false },
    gust_kn: { type: DataTypes.DOUBLE, allowNull: false },
    surge_m: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    arrives_at: ts,
    ends_at: ts,
    harbor_ids: { type: DataTypes.JSON, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false },
    share_details: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    checklist: { type: DataTypes.JSON, allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false },
    opened_by_id: fk('users', 'SET NULL', true),
    closed_by_id: fk('users', 'SET NULL', true),
    closed_at: { type: DataTypes.DATE, allowNull: true },
    lessons: { type: DataTypes.TEXT, allowNull: true },
    lessons_post_id: fk('posts', 'SET NULL', true),
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('storm_watches', ['status', 'arrives_at'], { name: 'storm_watches_status' });
  await qi.createTable('storm_readiness', {
    id,
    watch_id: fk('storm_watches', 'CASCADE', false),
    boat_id: fk('boats', 'CASCADE', false),
    location: { type: DataTypes.STRING(20), allowNull: true },
    plan_id: fk('tackle_plans', 'SET NULL', true),
    depth_m: { type: DataTypes.DOUBLE, allowNull: true },
    ticked: { type: DataTypes.JSON, allowNull: false },
    help_wanted: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    help_note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    buddy_user_id: fk('users', 'SET NULL', true),
    filled_at: { type: DataTypes.DATE, allowNull: true },
    created_at: ts,
    updated_at: ts,
  });
  await qi.addIndex('storm_readiness', ['watch_id', 'boat_id'], {
    name: 'storm_readiness_watch_boat',
    unique: true,
  });
  await qi.addIndex('storm_readiness', ['buddy_user_id'], { name: 'storm_readiness_buddy' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('storm_readiness');
  await qi.dropTable('storm_watches');
}
