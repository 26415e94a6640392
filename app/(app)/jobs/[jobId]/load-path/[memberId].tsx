import { useLocalSearchParams } from 'expo-router';
import { useJob } from '@/lib/hooks/use-job';
import { useMember } from '@/lib/hooks/use-member';
import { ErrorView } from '@/lib/ui/error-view';
import { LazyMemberLoadPath, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';
import { LoadingView } from '@/lib/ui/loading-view';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function MemberLoadPathPage() {
  const { jobId, memberId } = useLocalSearchParams<{ jobId: string; memberId: string }>();
  const job = useJob(jobId);
  const member = useMember(memberId);
  const error = job.error ?? member.error;
  if (error) return <ErrorView error={error} onRetry={() => void member.mutate()} />;
  if (!job.data || !member.data) return <LoadingView />;
  return (
    <Screen title={`Load path: ${member.data.label}`}>
      <TextLink href={`/jobs/${jobId}/members/${memberId}`} label={`Back to ${member.data.label}`} />
      <WorkspaceSuspense>
        <LazyMemberLoadPath job={job.data} memberId={memberId} />
      </WorkspaceSuspense>
    </Screen>
  );
}
