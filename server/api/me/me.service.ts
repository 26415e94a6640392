import type { Db } from '@/db/client';
import { AppError } from '@/server/app-error';
import type { Me, Membership } from '@/shared/schemas/auth';
import { findUser, listMemberships } from './me.repository';

/** The membership named by `preferredOrgId` when the user has it, otherwise the earliest one. */
export function pickActiveMembership(list: Membership[], preferredOrgId?: string): Membership | undefined {
  return list.find((m) => m.orgId === preferredOrgId) ?? list[0];
}

export function createMeService(db: Db) {
  return {
    /** Builds the `Me` answer; a user without any firm is refused (every account is made with one). */
    describe(userId: string, preferredOrgId?: string): Me {
      const user = findUser(db, userId);
      if (!user) throw new AppError('unauthorized', 'Sign in to continue');
      const list = listMemberships(db, userId);
      const active = pickActiveMembership(list, preferredOrgId);
      if (!active) throw new AppError('forbidden', 'This account does not belong to any firm');
      const { emailVerifiedAt, ...person } = user;
      return {
        user: { ...person, emailVerified: emailVerifiedAt !== null },
        memberships: list,
        activeOrgId: active.orgId,
        role: active.role,
      };
    },
  };
}

export type MeService = ReturnType<typeof createMeService>;
