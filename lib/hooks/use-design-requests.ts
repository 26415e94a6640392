import useSWR from 'swr';
import useSWRImmutable from 'swr/immutable';
import {
  fetchJobRequests,
  fetchRequest,
  fetchRequests,
  fetchRequestVersion,
} from '@/lib/api/design-requests';
import { keys } from '@/lib/api/keys';
import type { RequestState } from '@/shared/schemas/requests/workflow';
import { useMe } from './use-me';

/** The viewer's design requests, newest first: the firm's, or those sent to the engineer. */
export function useRequests(state: RequestState | undefined) {
  const { data: me } = useMe();
  return useSWR(me ? keys.requests(me.activeOrgId, state ?? 'all') : null, () => fetchRequests(state));
}

export function useJobRequests(jobId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && jobId ? keys.jobRequests(me.activeOrgId, jobId) : null, () =>
    fetchJobRequests(jobId as string),
  );
}

export function useRequest(requestId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && requestId ? keys.request(me.activeOrgId, requestId) : null, () =>
    fetchRequest(requestId as string),
  );
}

/** One sent version's snapshot; a version never changes after it is sent, so it is fetched once. */
export function useRequestVersion(requestId: string, version: number) {
  const { data: me } = useMe();
  return useSWRImmutable(me ? keys.requestVersion(me.activeOrgId, requestId, version) : null, () =>
    fetchRequestVersion(requestId, version),
  );
}
