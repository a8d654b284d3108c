import { DataTypes, type QueryInterface } from 'sequelize';
import { fk, id, ts } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('boats', {
    id,
    owner_id: fk('users', 'CASCADE', false),
    name: { type: DataTypes.STRING(80), allowNull: false },
    hull: { type: DataTypes.STRING(12), allowNull: false },
    loa_m: { type: DataTypes.DOUBLE, allowNull: false },
    beam_m: { type: DataTypes.DOUBLE, allowNull: true },
    displacement_kg: { type: DataTypes.DOUBLE, allowNull: true },
    draft_m: { type: DataTypes.DOUBLE, allowNull: true },
    bow_height_m: { type: DataTypes.DOUBLE, allowNull: false },
    gypsy: { type: DataTypes.JSON, allowNull: true },
    home_harbor_id: fk('harbors', 'SET NULL', true),
    created_at: ts,
    updated_at: ts,
  });
  await qi.createTable('tackle_plans', {
    id,
    boat_id: fk('boats', 'CASCADE', false),
    owner_id: fk('users', 'CASCADE', false),
    name: { type: DataTypes.STRING(80), allowNull: false },
    condition: { type: DataTypes.STRING(20), allowNull: false },
    wind_kn: { type: DataTypes.DOUBLE, allowNull: false },
    depth_m: { type: DataTypes.DOUBLE, allowNull: false },
    tide_m: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    bottom: { type: DataTypes.STRING(10), allowNull: true },
    components: { type: DataTypes.JSON, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    created_at: ts,
    updated_at: ts,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('tackle_plans');
  await qi.dropTable('boats');
}
