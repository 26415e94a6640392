import { useLocalSearchParams } from 'expo-router';
import { useJob } from '@/lib/hooks/use-job';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { ComposeForm } from '@/lib/ui/requests/compose-form';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function NewRequest() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const { data: job, error, mutate } = useJob(jobId);
  if (error) {
    return (
      <Screen title="New design request">
        <ErrorView error={error} onRetry={() => mutate()} />
      </Screen>
    );
  }
  if (!job) return <LoadingView />;
  return (
    <Screen title={`Design request: ${job.name}`} narrow>
      <TextLink href={`/jobs/${job.id}`} label="Back to the job" />
      <ComposeForm job={job} />
    </Screen>
  );
}
