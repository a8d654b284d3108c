import { DataTypes, type QueryInterface } from 'sequelize';

// Plans say who they are for (individual, family, junior …). Existing plans whose code names a kind take it;
// the rest start as individual and the treasurer can change them.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('membership_plans', 'kind', {
    type: DataTypes.STRING(20),
    allowNull: false,
    defaultValue: 'individual',
  });
  await qi.sequelize.query(
    "UPDATE membership_plans SET kind = code WHERE code IN ('family', 'junior', 'senior', 'associate')",
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('membership_plans', 'kind');
}
