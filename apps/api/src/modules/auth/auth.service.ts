import { getSetting } from '../club/club.service';
import { randomBytes } from 'node:crypto';
import { Op, type Sequelize, type Transaction } from 'sequelize';
import type { ResetConfirmInput, SignupInput } from '@app/shared';
import { AppError } from '../../errors/app-error';
import { Session, User, UserRole } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { passwords } from './password-hash';
import { consumeToken, issueToken } from './tokens';

export interface AuthDeps {
  sequelize: Sequelize;
  publicUrl: string;
  bcryptCost: number;
}

// A bcrypt hash of a random string at the configured cost, compared when the e-mail is unknown so that both
// paths take the same time and sign-in does not reveal which addresses have accounts.
const dummyHashes = new Map<number, Promise<string>>();
const dummyHash = (cost: number) => {
  let h = dummyHashes.get(cost);
  if (!h) dummyHashes.set(cost, (h = passwords.hash(randomBytes(16).toString('hex'), cost)));
  return h;
};

/** Queues an e-mail to the member, greeted by name, through the outbox (inside `transaction` when given). */
const mailMember = (
  user: Pick<User, 'email' | 'displayName'>,
  mail: Omit<Parameters<typeof actionEmail>[0], 'to' | 'greeting'>,
  transaction?: Transaction,
) =>
  enqueueEmail(
    actionEmail({ to: user.email, greeting: `Hello ${user.displayName},`, ...mail }),
    transaction,
  );

/** What a member reads after their password changed, however it changed. */
const PASSWORD_CHANGED_MAIL = {
  kind: 'password-changed',
  subject: 'Your Rodewise password was changed',
  footer: 'If this was not you, reset your password now and tell your club admin.',
};

/** Logs a password change or reset on the member's own account, in its transaction. */
const auditPassword = (userId: number, action: string, transaction: Transaction) =>
  recordAudit(
    { actorId: userId, area: 'auth', action, subjectType: 'user', subjectId: String(userId) },
    transaction,
  );

export const findUserByEmail = (email: string) =>
  User.findOne({
    where: { email: email.trim().toLowerCase() },
    include: [{ model: UserRole, as: 'roles' }],
  });

export const findUserById = (id: number) =>
  User.findByPk(id, { include: [{ model: UserRole, as: 'roles' }] });

/**
 * Creates an unverified member and e-mails a verification link. When the address is already registered, the
 * owner gets a "you already have an account" note instead, so sign-up never reveals who is a member. Both paths
 * hash the password once (the cost that dominates the answer time), so timing does not tell them apart either.
 */
export async function signup(deps: AuthDeps, input: SignupInput): Promise<void> {
  const [existing, passwordHash] = await Promise.all([
    findUserByEmail(input.email),
    passwords.hash(input.password, deps.bcryptCost),
  ]);
  if (existing) {
    await mailMember(existing, {
      kind: 'signup-existing',
      subject: 'You already have a Rodewise account',
      lines: [
        'Someone (perhaps you) tried to join Rodewise with this e-mail address, which already has an account.',
      ],
      actionLabel: 'Reset your password',
      actionUrl: `${deps.publicUrl}/reset`,
    });
    return;
  }
  // New members start in the club's units; they can switch on any tackle screen.
  const { unitSystem } = await getSetting('locale');
  await deps.sequelize.transaction(async (transaction) => {
    const user = await User.create(
      {
        email: input.email,
        displayName: input.displayName,
        passwordHash,
        emailVerifiedAt: null,
        unitSystem,
      },
      { transaction },
    );
    await UserRole.create({ userId: user.id, role: 'member', grantedById: null }, { transaction });
    await sendVerification(deps, user, transaction);
  });
}

async function sendVerification(deps: AuthDeps, user: User, transaction?: Transaction) {
  const token = await issueToken(user.id, 'verify', transaction);
  await enqueueEmail(
    actionEmail({
      to: user.email,
      kind: 'verify-email',
      subject: 'Confirm your e-mail for Rodewise',
      greeting: `Welcome aboard, ${user.displayName}.`,
      lines: [
        'Please confirm this e-mail address to finish joining your club on Rodewise. The link works for 48 hours.',
      ],
      actionLabel: 'Confirm my e-mail',
      actionUrl: `${deps.publicUrl}/verify-email?token=${token}`,
    }),
    transaction,
  );
}

/** Sends a fresh verification link to an unverified account; silent for unknown or verified addresses. */
export async function resendVerification(deps: AuthDeps, email: string): Promise<void> {
  const user = await findUserByEmail(email);
  if (!user || user.emailVerifiedAt) return;
  await sendVerification(deps, user);
}

/** Marks the e-mail verified; 410 for a used or expired link. */
export async function verifyEmail(deps: AuthDeps, token: string): Promise<User> {
  const userId = await deps.sequelize.transaction(async (t) => {
    const id = await consumeToken(token, 'verify', t);
    await User.update({ emailVerifiedAt: new Date() }, { where: { id }, transaction: t });
    return id;
  });
  const user = await findUserById(userId);
  if (!user) throw new AppError('GONE', 'This account no longer exists');
  return user;
}

/** Checks e-mail + password. Throws UNAUTHENTICATED (same message for both failures) or EMAIL_NOT_VERIFIED. */
export async function checkCredentials(
  deps: AuthDeps,
  email: string,
  password: string,
): Promise<User> {
  const user = await findUserByEmail(email);
  const ok = await passwords.compare(
    password,
    user?.passwordHash ?? (await dummyHash(deps.bcryptCost)),
  );
  if (!user || !ok) throw new AppError('UNAUTHENTICATED', 'E-mail or password is wrong');
  if (!user.emailVerifiedAt) {
    throw new AppError(
      'EMAIL_NOT_VERIFIED',
      'Please confirm your e-mail first: use the link we sent, or ask for a new one.',
    );
  }
  return user;
}

/**
 * E-mails a reset link when the account exists. The router answers 202 before this runs (`inBackground`), so
 * known and unknown addresses answer in the same time.
 */
export async function requestPasswordReset(deps: AuthDeps, email: string): Promise<void> {
  const user = await findUserByEmail(email);
  if (!user) return;
  const token = await issueToken(user.id, 'reset');
  await mailMember(user, {
    kind: 'password-reset',
    subject: 'Reset your Rodewise password',
    lines: ['We received a request to reset your password. The link works once, for one hour.'],
    actionLabel: 'Choose a new password',
    actionUrl: `${deps.publicUrl}/reset-password?token=${token}`,
    footer: 'If you did not ask for this, ignore this e-mail: your password stays as it is.',
  });
}

/** Sets a new password from a reset link, signs the user out everywhere, and confirms by e-mail. */
export async function confirmPasswordReset(
  deps: AuthDeps,
  input: ResetConfirmInput,
): Promise<void> {
  const passwordHash = await passwords.hash(input.password, deps.bcryptCost);
  await deps.sequelize.transaction(async (t) => {
    const userId = await consumeToken(input.token, 'reset', t);
    const user = await User.findByPk(userId, { transaction: t, lock: t.LOCK.UPDATE });
    if (!user) throw new AppError('GONE', 'This account no longer exists');
    await user.update(
      { passwordHash, emailVerifiedAt: user.emailVerifiedAt ?? new Date() },
      { transaction: t },
    );
    await Session.destroy({ where: { userId }, transaction: t });
    await auditPassword(userId, 'password.reset', t);
    await mailMember(
      user,
      {
        ...PASSWORD_CHANGED_MAIL,
        lines: ['Your password was just changed and every device was signed out.'],
      },
      t,
    );
  });
}

/**
 * Changes the password of a signed-in user after checking the current one, signs out every other session of
 * theirs (this device stays signed in) and tells them by e-mail.
 */
export async function changePassword(
  deps: AuthDeps,
  user: User,
  currentPassword: string,
  newPassword: string,
  currentSessionId: string,
) {
  if (!(await passwords.compare(currentPassword, user.passwordHash))) {
    throw new AppError('VALIDATION_FAILED', 'Some fields need attention', {
      currentPassword: 'This is not your current password',
    });
  }
  const passwordHash = await passwords.hash(newPassword, deps.bcryptCost);
  await deps.sequelize.transaction(async (t) => {
    await user.update({ passwordHash }, { transaction: t });
    await Session.destroy({
      where: { userId: user.id, sid: { [Op.ne]: currentSessionId } },
      transaction: t,
    });
    await auditPassword(user.id, 'password.change', t);
    await mailMember(
      user,
      {
        ...PASSWORD_CHANGED_MAIL,
        lines: [
          'Your password was just changed from your account page. Every other device was signed out; the one you used stays signed in.',
        ],
      },
      t,
    );
  });
}
