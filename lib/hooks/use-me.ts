import useSWR from 'swr';
import { fetchMe } from '@/lib/api/auth';
import { keys } from '@/lib/api/keys';
import { useActiveOrgId } from './use-active-org-id';

/** The signed-in person; `error.status === 401` means signed out. */
export function useMe() {
  const orgId = useActiveOrgId();
  return useSWR(keys.me(orgId), fetchMe);
}
