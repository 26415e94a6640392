import useSWR from 'swr';
import { keys } from '@/lib/api/keys';
import { fetchShoring } from '@/lib/api/shoring-plans';
import { useMe } from './use-me';

/** The member's saved shoring plan (null before one is saved). */
export function useShoring(memberId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && memberId ? keys.shoring(me.activeOrgId, memberId) : null, () =>
    fetchShoring(memberId as string),
  );
}
