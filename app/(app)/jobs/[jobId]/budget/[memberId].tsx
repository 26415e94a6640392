import { useLocalSearchParams } from 'expo-router';
import { LazyMemberBudgetScreen, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';

export default function MemberBudgetPage() {
  const { jobId, memberId } = useLocalSearchParams<{ jobId: string; memberId: string }>();
  return (
    <WorkspaceSuspense>
      <LazyMemberBudgetScreen jobId={jobId} memberId={memberId} />
    </WorkspaceSuspense>
  );
}
