import { DataTypes, type QueryInterface } from 'sequelize';

// Listing changes are picked up by other API processes from `updated_at`; whole seconds could not tell two
// changes of one listing within a second apart, so it keeps milliseconds.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.changeColumn('listings', 'updated_at', { type: DataTypes.DATE(3), allowNull: false });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.changeColumn('listings', 'updated_at', { type: DataTypes.DATE, allowNull: false });
}
