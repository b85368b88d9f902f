// Accounts: sign-up with e-mail verification, password check for sign-in, reset by e-mailed link,
// and account settings.
import { Op, type Transaction } from 'sequelize';
import { AccountToken, Invitation, User } from '../models';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { hashPassword, passwordMatches } from '../auth/passwords';
import { forgetCachedSessions } from '../auth/session';
import { HOUR_MS, hashToken, newLinkToken } from './tokens';
import { accountExistsMail, resetMail, verificationMail } from '../mail/templates';
import type { OutgoingMail } from '../mail/mailer';
import type { TokenPurpose } from '../models/account-token';
import type { ChangePasswordBody, ResetBody, SignUpBody, UpdateAccountBody } from '../../shared/schemas';

const VERIFY_TTL_MS = 48 * HOUR_MS;
const RESET_TTL_MS = 1 * HOUR_MS;

export { hashPassword };

/** A link token and the mail carrying it, saved in one transaction (the caller's, if given): neither exists without the other. */
async function mailLinkToken(ctx: AppContext, userId: number, purpose: TokenPurpose, ttlMs: number, mail: (token: string) => OutgoingMail, transaction?: Transaction): Promise<void> {
  const save = async (t: Transaction): Promise<void> => {
    const { token, tokenHash } = newLinkToken();
    await AccountToken.create({ userId, purpose, tokenHash, expiresAt: new Date(Date.now() + ttlMs) }, { transaction: t });
    await ctx.mailer.send(mail(token), { transaction: t });
  };
  await (transaction ? save(transaction) : ctx.sequelize.transaction(save));
}

/** Marks a token used exactly once (a second use, or an expired token, is refused). */
async function consumeToken(token: string, purpose: TokenPurpose, transaction?: Transaction): Promise<number> {
  const [count, rows] = await AccountToken.update(
    { usedAt: new Date() },
    {
      where: { tokenHash: hashToken(token), purpose, usedAt: null, expiresAt: { [Op.gt]: new Date() } },
      returning: true,
      transaction,
    },
  );
  if (count !== 1) {
    const what = purpose === 'verify' ? 'confirmation' : 'reset';
    throw new AppError(400, 'token_invalid', `This ${what} link is invalid, used or expired: ask for a new one.`);
  }
  return rows[0].userId;
}

async function hasOpenInvitation(email: string, token: string): Promise<boolean> {
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token), email, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
  });
  return invitation !== null;
}

export async function signUp(ctx: AppContext, body: SignUpBody): Promise<void> {
  const existing = await User.findOne({ where: { email: body.email } });
  if (existing) {
    // Same answer as a new sign-up, so the form does not reveal who has an account; the owner of
    // the address learns of the attempt by mail.
    await ctx.mailer.send(accountExistsMail(ctx.config.appUrl, existing.email, existing.name));
    return;
  }
  // Arriving from an invitation sent to this address proves the address, so no second mail.
  const verifiedByInvitation = body.invitation ? await hasOpenInvitation(body.email, body.invitation) : false;
  const passwordHash = await hashPassword(body.password);
  await ctx.sequelize.transaction(async (transaction) => {
    const user = await User.create({ email: body.email, name: body.name, passwordHash, emailVerifiedAt: verifiedByInvitation ? new Date() : null }, { transaction });
    if (!verifiedByInvitation) await sendVerification(ctx, user, transaction);
  });
}

export async function sendVerification(ctx: AppContext, user: User, transaction?: Transaction): Promise<void> {
  await mailLinkToken(ctx, user.id, 'verify', VERIFY_TTL_MS, (token) => verificationMail(ctx.config.appUrl, user.email, user.name, token), transaction);
}

export async function resendVerification(ctx: AppContext, email: string): Promise<void> {
  const user = await User.findOne({ where: { email, emailVerifiedAt: null } });
  if (user) await sendVerification(ctx, user);
}

export async function verifyEmail(token: string): Promise<void> {
  const userId = await consumeToken(token, 'verify');
  await User.update({ emailVerifiedAt: new Date() }, { where: { id: userId, emailVerifiedAt: null } });
}

export type PasswordCheck = { user: User } | { failure: 'wrong' | 'unverified' | 'disabled' };

export async function checkPassword(email: string, password: string): Promise<PasswordCheck> {
  const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
  // One bcrypt comparison whether or not the address exists, so timing does not reveal accounts.
  const matches = await passwordMatches(password, user?.passwordHash ?? null);
  if (!user || !matches) return { failure: 'wrong' };
  if (user.disabledAt) return { failure: 'disabled' };
  if (!user.emailVerifiedAt) return { failure: 'unverified' };
  return { user };
}

export async function requestReset(ctx: AppContext, email: string): Promise<void> {
  const user = await User.findOne({ where: { email } });
  if (!user || user.disabledAt) return;
  await mailLinkToken(ctx, user.id, 'reset', RESET_TTL_MS, (token) => resetMail(ctx.config.appUrl, user.email, user.name, token));
}

export async function resetPassword(ctx: AppContext, body: ResetBody): Promise<void> {
  const passwordHash = await hashPassword(body.password);
  await ctx.sequelize.transaction(async (transaction) => {
    const userId = await consumeToken(body.token, 'reset', transaction);
    // Following the e-mailed link also proves the address.
    await User.update({ passwordHash }, { where: { id: userId }, transaction });
    await User.update({ emailVerifiedAt: new Date() }, { where: { id: userId, emailVerifiedAt: null }, transaction });
    await endSessionsOf(ctx, userId, transaction);
  });
}

/** Signs a person out everywhere (after a password reset or when an admin disables them). */
export async function endSessionsOf(ctx: AppContext, userId: number, transaction?: Transaction): Promise<void> {
  await ctx.sequelize.query(`DELETE FROM "session" WHERE (sess -> 'passport' ->> 'user') = :userId`, {
    replacements: { userId: String(userId) },
    transaction,
  });
  // Now, and again once the delete is visible to other connections' reads.
  forgetCachedSessions();
  transaction?.afterCommit(forgetCachedSessions);
}

export async function updateAccount(user: User, body: UpdateAccountBody): Promise<User> {
  return user.update({ ...(body.name ? { name: body.name } : {}), ...(body.areaUnit ? { areaUnit: body.areaUnit } : {}) });
}

export async function changePassword(user: User, body: ChangePasswordBody): Promise<void> {
  if (!(await passwordMatches(body.currentPassword, user.passwordHash))) {
    throw new AppError(400, 'wrong_password', 'The current password is not right: type it again, or use "Forgot password".');
  }
  await user.update({ passwordHash: await hashPassword(body.newPassword) });
}
