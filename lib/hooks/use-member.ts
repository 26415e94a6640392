import useSWR from 'swr';
import { keys } from '@/lib/api/keys';
import { fetchMember } from '@/lib/api/structural-members';
import { useMe } from './use-me';

/** One saved header or beam with its input and the server's result. */
export function useMember(memberId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && memberId ? keys.member(me.activeOrgId, memberId) : null, () =>
    fetchMember(memberId as string),
  );
}
