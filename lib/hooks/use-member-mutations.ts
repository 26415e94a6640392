import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import { keys } from '@/lib/api/keys';
import { createInvitation, revokeInvitation } from '@/lib/api/orgs';
import type { CreateInvitationInput } from '@/shared/schemas/orgs';
import { useMe } from './use-me';

/** Invite and revoke, refreshing the members list of the active firm. */
export function useMemberMutations() {
  const { data: me } = useMe();
  const { mutate } = useSWRConfig();
  const orgId = me?.activeOrgId ?? '';

  return {
    invite: useCallback(
      async (input: CreateInvitationInput) => {
        const invitation = await createInvitation(input);
        await mutate(keys.members(orgId));
        return invitation;
      },
      [mutate, orgId],
    ),
    revoke: useCallback(
      async (invitationId: string) => {
        await revokeInvitation(invitationId);
        await mutate(keys.members(orgId));
      },
      [mutate, orgId],
    ),
  };
}
