import { useLocalSearchParams } from 'expo-router';
import { useMember } from '@/lib/hooks/use-member';
import { useShoring } from '@/lib/hooks/use-shoring';
import { ErrorView } from '@/lib/ui/error-view';
import { LazyShoringPlanner, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';
import { LoadingView } from '@/lib/ui/loading-view';
import { Screen } from '@/lib/ui/screen';
import { Text } from '@/lib/ui/text';
import { TextLink } from '@/lib/ui/text-link';

export default function ShoringPage() {
  const { jobId, memberId } = useLocalSearchParams<{ jobId: string; memberId: string }>();
  const member = useMember(memberId);
  const shoring = useShoring(memberId);
  const error = member.error ?? shoring.error;
  if (error) return <ErrorView error={error} onRetry={() => void shoring.mutate()} />;
  if (!member.data || shoring.data === undefined) return <LoadingView />;
  return (
    <Screen title={`Shoring for ${member.data.label}`}>
      <TextLink href={{ pathname: '/jobs/[jobId]', params: { jobId } }} label="Back to the job" />
      <Text tone="muted">
        The temporary walls carry this member’s saved loads ({member.data.input.clearSpanFt} ft clear span)
        while the wall comes out.
      </Text>
      <WorkspaceSuspense>
        <LazyShoringPlanner
          jobId={jobId}
          memberId={memberId}
          member={member.data.input}
          saved={shoring.data}
        />
      </WorkspaceSuspense>
    </Screen>
  );
}
