import useSWR from 'swr';
import { fetchJobBudget, fetchMemberBudget } from '@/lib/api/budgets';
import { keys } from '@/lib/api/keys';
import { fetchPriceBook } from '@/lib/api/price-book';
import { useMe } from './use-me';

/** The firm's price book. */
export function usePriceBook() {
  const { data: me } = useMe();
  return useSWR(me ? keys.priceBook(me.activeOrgId) : null, fetchPriceBook);
}

/** One member's budget as the server computes it from the price book. */
export function useMemberBudget(memberId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && memberId ? keys.memberBudget(me.activeOrgId, memberId) : null, () =>
    fetchMemberBudget(memberId as string),
  );
}

/** A job's members' budgets summed, with the budgets sent to the client. */
export function useJobBudget(jobId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && jobId ? keys.jobBudget(me.activeOrgId, jobId) : null, () =>
    fetchJobBudget(jobId as string),
  );
}
