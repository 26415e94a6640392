import { useLocalSearchParams } from 'expo-router';
import { useJob } from '@/lib/hooks/use-job';
import { useMe } from '@/lib/hooks/use-me';
import { useMemberSave } from '@/lib/hooks/use-member-save';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { LazyMemberEditor, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';

export default function NewMemberPage() {
  const { jobId, kind } = useLocalSearchParams<{ jobId: string; kind?: string }>();
  const memberKind = kind === 'header' ? 'header' : 'beam';
  const { data: job, error, mutate } = useJob(jobId);
  const { data: me } = useMe();
  const save = useMemberSave(jobId);
  if (error) return <ErrorView error={error} onRetry={() => mutate()} />;
  if (!job || !me) return <LoadingView />;
  return (
    <WorkspaceSuspense>
      <LazyMemberEditor
        key={`new-${memberKind}`}
        job={job}
        kind={memberKind}
        storageKey={`${me.user.id}.${job.id}.new-${memberKind}`}
        onSave={save}
      />
    </WorkspaceSuspense>
  );
}
