import useSWR from 'swr';
import { keys } from '@/lib/api/keys';
import { fetchInvitation } from '@/lib/api/orgs';

export function useInvitation(token: string | undefined) {
  return useSWR(token ? keys.invitation(token) : null, () => fetchInvitation(token as string));
}
