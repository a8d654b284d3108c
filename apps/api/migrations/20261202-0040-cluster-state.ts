import { DataTypes, type QueryInterface } from 'sequelize';

// State that several API processes (on several machines) must share lives in the database, not in process memory:
// rate-limit counters (one row per limiter and key, the key hashed) and job leases (one row per timed job, so a job
// runs in one process at a time across a cluster). The migrator also creates job_leases itself before the first
// migration, because the migration lock is a lease row; the IF NOT EXISTS form keeps both paths safe.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(
    'CREATE TABLE IF NOT EXISTS job_leases (name VARCHAR(64) NOT NULL PRIMARY KEY, owner VARCHAR(96) NOT NULL, expires_at DATETIME(3) NOT NULL) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4',
  );
  await qi.createTable('rate_limit_hits', {
    key_hash: { type: DataTypes.CHAR(64), primaryKey: true },
    hits: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    reset_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('rate_limit_hits', ['reset_at'], { name: 'rate_limit_hits_reset_at' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('rate_limit_hits');
  await qi.dropTable('job_leases');
}
