import type { Db, DbOrTx } from '@/db/client';
import { AppError } from '@/server/app-error';
import { recordAudit } from '@/server/api/audit/audit.repository';
import { hashLinkToken, newLinkToken } from '@/server/services/link-token';
import type { Mailer } from '@/server/services/mail/mailer';
import { enqueueMail } from '@/server/services/mail/outbox.repository';
import { passwordResetMail } from '@/server/services/mail/password-reset-mail';
import { verificationMail } from '@/server/services/mail/verification-mail';
import { refusePassword } from '@/server/services/password-rules';
import { hashPassword, verifyPassword } from '@/server/services/password';
import type { SignInInput, signUpSchema } from '@/shared/schemas/auth';
import type { z } from 'zod';
import {
  deleteSessionsOf,
  deleteUnusedTokens,
  findOpenToken,
  findUserByEmail,
  insertAuthToken,
  insertMembership,
  insertOrganization,
  insertUser,
  markEmailVerified,
  markTokenUsed,
  updatePasswordHash,
} from './auth.repository';
import { findUser } from '@/server/api/me/me.repository';

type SignUp = z.output<typeof signUpSchema>;

const WRONG_CREDENTIALS = 'E-mail or password is wrong';
/** How long a password reset link works. */
export const RESET_MINUTES = 60;
/** How long an e-mail confirmation link works. */
const VERIFY_DAYS = 7;
const VERIFY_GONE = 'This confirmation link is not valid any more. Ask for a new one.';
const RESET_GONE = 'This reset link is not valid any more. Ask for a new one.';

export function createAuthService(deps: { db: Db; mailer: Mailer; appOrigin: string }) {
  const { db } = deps;

  /** Writes a confirmation token and its e-mail; call inside the transaction that needs it. */
  function queueVerification(tx: DbOrTx, user: { id: string; email: string; name: string }): void {
    const { token, tokenHash } = newLinkToken();
    const expiresAt = new Date(Date.now() + VERIFY_DAYS * 24 * 60 * 60_000);
    deleteUnusedTokens(tx, user.id, 'email-verification');
    insertAuthToken(tx, { userId: user.id, purpose: 'email-verification', tokenHash, expiresAt });
    enqueueMail(
      tx,
      verificationMail({ to: user.email, name: user.name, link: `${deps.appOrigin}/verify-email/${token}` }),
    );
  }
  /** Hashed once at start so an unknown e-mail costs as much as a wrong password. */
  const decoyHash = hashPassword('decoy password, never matches');

  return {
    /** Creates the user and their firm: a contracting firm makes them `owner`, an engineering firm `engineer`. */
    async signUp(input: SignUp): Promise<{ userId: string; orgId: string }> {
      if (findUserByEmail(db, input.email)) {
        throw new AppError('conflict', 'An account with this e-mail already exists', {
          email: ['An account with this e-mail already exists'],
        });
      }
      refusePassword(input.password, { email: input.email, name: input.name });
      const passwordHash = await hashPassword(input.password);
      const created = db.transaction((tx) => {
        const userId = insertUser(tx, { email: input.email, name: input.name, passwordHash });
        const orgId = insertOrganization(tx, { name: input.firmName, kind: input.firmKind });
        const role = input.firmKind === 'engineering' ? 'engineer' : 'owner';
        insertMembership(tx, { userId, orgId, role });
        recordAudit(tx, { userId, orgId }, { action: 'org.create', subject: orgId, detail: { role } });
        queueVerification(tx, { id: userId, email: input.email, name: input.name });
        return { userId, orgId };
      });
      deps.mailer.wake();
      return created;
    },

    /** Mails a new confirmation link (voiding older ones) to a signed-in person not confirmed yet. */
    resendVerification(userId: string): void {
      const user = findUser(db, userId);
      if (!user || user.emailVerifiedAt) return;
      db.transaction((tx) => queueVerification(tx, user));
      deps.mailer.wake();
    },

    /** Confirms the address the link was mailed to; the link works once. */
    verifyEmail(token: string): void {
      const found = findOpenToken(db, hashLinkToken(token), 'email-verification', new Date());
      if (!found) throw new AppError('not_found', VERIFY_GONE);
      db.transaction((tx) => {
        if (!markTokenUsed(tx, found.id, new Date())) throw new AppError('not_found', VERIFY_GONE);
        markEmailVerified(tx, found.userId, new Date());
      });
    },

    /** Never says whether the e-mail or the password was wrong. */
    async signIn(input: SignInInput): Promise<{ userId: string }> {
      const user = findUserByEmail(db, input.email);
      const matches = await verifyPassword(input.password, user?.passwordHash ?? (await decoyHash));
      if (!user || !matches) throw new AppError('unauthorized', WRONG_CREDENTIALS);
      return { userId: user.id };
    },

    /**
     * Mails a single-use reset link when the address has an account, and does nothing otherwise: the answer
     * is the same either way, so it tells nobody who has an account. A newer link voids the older ones.
     */
    requestPasswordReset(email: string): void {
      const user = findUserByEmail(db, email);
      if (!user) return;
      const { token, tokenHash } = newLinkToken();
      const expiresAt = new Date(Date.now() + RESET_MINUTES * 60_000);
      db.transaction((tx) => {
        deleteUnusedTokens(tx, user.id, 'password-reset');
        insertAuthToken(tx, { userId: user.id, purpose: 'password-reset', tokenHash, expiresAt });
        enqueueMail(
          tx,
          passwordResetMail({
            to: user.email,
            name: user.name,
            link: `${deps.appOrigin}/reset-password/${token}`,
            minutes: RESET_MINUTES,
          }),
        );
      });
      deps.mailer.wake();
    },

    /**
     * Sets a new password with a reset link's token: the token is used up, and every session of the person
     * ends (the caller then opens one for this browser), all in one transaction.
     */
    async resetPassword(token: string, password: string): Promise<{ userId: string }> {
      const found = findOpenToken(db, hashLinkToken(token), 'password-reset', new Date());
      const user = found && findUser(db, found.userId);
      if (!found || !user) throw new AppError('not_found', RESET_GONE);
      refusePassword(password, user);
      const passwordHash = await hashPassword(password);
      db.transaction((tx) => {
        if (!markTokenUsed(tx, found.id, new Date())) throw new AppError('not_found', RESET_GONE);
        updatePasswordHash(tx, user.id, passwordHash);
        deleteSessionsOf(tx, user.id);
      });
      return { userId: user.id };
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
