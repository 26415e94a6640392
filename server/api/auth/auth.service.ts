import type { Db } from '@/db/client';
import { AppError } from '@/server/app-error';
import { recordAudit } from '@/server/api/audit/audit.repository';
import { hashPassword, verifyPassword } from '@/server/services/password';
import type { SignInInput, signUpSchema } from '@/shared/schemas/auth';
import type { z } from 'zod';
import { findUserByEmail, insertMembership, insertOrganization, insertUser } from './auth.repository';

type SignUp = z.output<typeof signUpSchema>;

const WRONG_CREDENTIALS = 'E-mail or password is wrong';

export function createAuthService(db: Db) {
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
      const passwordHash = await hashPassword(input.password);
      return db.transaction((tx) => {
        const userId = insertUser(tx, { email: input.email, name: input.name, passwordHash });
        const orgId = insertOrganization(tx, { name: input.firmName, kind: input.firmKind });
        const role = input.firmKind === 'engineering' ? 'engineer' : 'owner';
        insertMembership(tx, { userId, orgId, role });
        recordAudit(tx, { userId, orgId }, { action: 'org.create', subject: orgId, detail: { role } });
        return { userId, orgId };
      });
    },

    /** Never says whether the e-mail or the password was wrong. */
    async signIn(input: SignInInput): Promise<{ userId: string }> {
      const user = findUserByEmail(db, input.email);
      const matches = await verifyPassword(input.password, user?.passwordHash ?? (await decoyHash));
      if (!user || !matches) throw new AppError('unauthorized', WRONG_CREDENTIALS);
      return { userId: user.id };
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
