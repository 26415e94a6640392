import { useLocalSearchParams } from 'expo-router';
import { useJob } from '@/lib/hooks/use-job';
import { useMe } from '@/lib/hooks/use-me';
import { useMemberSave } from '@/lib/hooks/use-member-save';
import { useScreen } from '@/lib/hooks/use-screen';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { LazyMemberEditor, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';

export default function NewMemberPage() {
  const { jobId, kind, fromScreen } = useLocalSearchParams<{
    jobId: string;
    kind?: string;
    fromScreen?: string;
  }>();
  const memberKind = kind === 'header' ? 'header' : 'beam';
  const { data: job, error, mutate } = useJob(jobId);
  const { data: me } = useMe();
  const save = useMemberSave(jobId);
  const screen = useScreen(fromScreen);
  if (error) return <ErrorView error={error} onRetry={() => mutate()} />;
  if (screen.error) return <ErrorView error={screen.error} onRetry={() => screen.mutate()} />;
  if (!job || !me || (fromScreen && !screen.data)) return <LoadingView />;
  const from = fromScreen && screen.data ? screen.data : null;
  return (
    <WorkspaceSuspense>
      <LazyMemberEditor
        key={`new-${memberKind}${from ? `-${from.id}` : ''}`}
        job={job}
        kind={memberKind}
        storageKey={`${me.user.id}.${job.id}.new-${memberKind}${from ? `.screen-${from.id}` : ''}`}
        prefill={from ? { wallLabel: from.wallLabel, answers: from.answers } : undefined}
        onSave={save}
      />
    </WorkspaceSuspense>
  );
}
