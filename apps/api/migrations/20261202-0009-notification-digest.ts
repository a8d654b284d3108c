import { DataTypes, type QueryInterface } from 'sequelize';

// A member may ask for a daily e-mail of the notices they have not read. The digest job remembers the last
// notice it considered for each member (digest_through_id), so a notice is mailed at most once, and when it
// last mailed them (digest_sent_at), so a member gets at most one digest a day.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('users', 'digest_opt_in', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
  await qi.addColumn('users', 'digest_through_id', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
  });
  await qi.addColumn('users', 'digest_sent_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addIndex('users', ['digest_opt_in'], { name: 'users_digest_opt_in' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex('users', 'users_digest_opt_in');
  await qi.removeColumn('users', 'digest_sent_at');
  await qi.removeColumn('users', 'digest_through_id');
  await qi.removeColumn('users', 'digest_opt_in');
}
