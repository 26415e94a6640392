import useSWR from 'swr';
import { keys } from '@/lib/api/keys';
import { fetchMembers } from '@/lib/api/orgs';
import { useMe } from './use-me';

/** Members and pending invitations; only fetched for the firm's owner. */
export function useMembers() {
  const { data: me } = useMe();
  return useSWR(me?.role === 'owner' ? keys.members(me.activeOrgId) : null, fetchMembers);
}
