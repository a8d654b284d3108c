import {
  QueryTypes,
  type Model,
  type ModelStatic,
  type Sequelize,
  type Transaction,
} from 'sequelize';

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

/**
 * Runs `fn` while holding a MariaDB named lock (`GET_LOCK`), for work that must not run twice at once but writes
 * through other connections (a row lock would then block the writes' own foreign-key checks). The lock lives on
 * a pinned connection and is released however `fn` ends; CONFLICT-style `onBusy` is thrown after `timeoutS`.
 */
export async function withNamedLock<T>(
  sequelize: Sequelize,
  name: string,
  fn: () => Promise<T>,
  onBusy: () => Error,
  timeoutS = 20,
): Promise<T> {
  return sequelize.transaction(async (transaction) => {
    const [row] = await sequelize.query<{ got: number | null }>('SELECT GET_LOCK(?, ?) AS got', {
      replacements: [name.slice(0, 64), timeoutS],
      type: QueryTypes.SELECT,
      transaction,
    });
    if (Number(row?.got) !== 1) throw onBusy();
    try {
      return await fn();
    } finally {
      await sequelize.query('SELECT RELEASE_LOCK(?) AS released', {
        replacements: [name.slice(0, 64)],
        type: QueryTypes.SELECT,
        transaction,
      });
    }
  });
}
