import { useLocalSearchParams } from 'expo-router';
import { JobBudgetScreen } from '@/lib/ui/budget/job-budget-screen';

export default function JobBudgetPage() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  return <JobBudgetScreen jobId={jobId} />;
}
