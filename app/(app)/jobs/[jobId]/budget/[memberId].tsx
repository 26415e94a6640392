import { useLocalSearchParams } from 'expo-router';
import { MemberBudgetScreen } from '@/lib/ui/budget/member-budget-screen';

export default function MemberBudgetPage() {
  const { jobId, memberId } = useLocalSearchParams<{ jobId: string; memberId: string }>();
  return <MemberBudgetScreen jobId={jobId} memberId={memberId} />;
}
