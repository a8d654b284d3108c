import type { ModelStatic, Model, Transaction } from 'sequelize';

/**
 * Runs `fn` in a transaction that first locks the parent row (`SELECT … FOR UPDATE`), so a "count, then insert
 * if under the limit" inside it cannot be raced: a concurrent request for the same parent waits for this one to
 * commit and then counts the row it added.
 */
export async function withParentLocked<T>(
  model: ModelStatic<Model>,
  id: number,
  fn: (transaction: Transaction) => Promise<T>,
): Promise<T> {
  const sequelize = model.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  return sequelize.transaction(async (transaction) => {
    await model.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
    return fn(transaction);
  });
}
