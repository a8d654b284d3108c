import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { AppError } from '../../errors/app-error';
import { EmailToken } from '../../models';
import type { EmailTokenKind } from '../../models/email-token.model';

export const TOKEN_TTL_MS: Record<EmailTokenKind, number> = {
  verify: 48 * 3600_000,
  reset: 3600_000,
};

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** Issues a single-use token; only its hash is stored. */
export async function issueToken(
  userId: number,
  kind: EmailTokenKind,
  transaction?: Transaction,
): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await EmailToken.create(
    {
      userId,
      kind,
      tokenHash: hashToken(token),
      expiresAt: new Date(Date.now() + TOKEN_TTL_MS[kind]),
      usedAt: null,
    },
    { transaction },
  );
  return token;
}

/** Marks a token used and returns its user id; 410 GONE if unknown, used or expired (one message, no oracle). */
export async function consumeToken(
  token: string,
  kind: EmailTokenKind,
  transaction: Transaction,
): Promise<number> {
  const row = await EmailToken.findOne({
    where: { tokenHash: hashToken(token), kind },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  if (!row || row.usedAt || row.expiresAt.getTime() < Date.now()) {
    throw new AppError(
      'GONE',
      'This link has already been used or has expired. Ask for a new one.',
    );
  }
  await row.update({ usedAt: new Date() }, { transaction });
  // One reset link at a time: using one retires the others of its kind.
  await EmailToken.update(
    { usedAt: new Date() },
    { where: { userId: row.userId, kind, usedAt: null, id: { [Op.ne]: row.id } }, transaction },
  );
  return row.userId;
}
