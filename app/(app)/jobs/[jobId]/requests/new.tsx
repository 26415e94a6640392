import { useLocalSearchParams } from 'expo-router';
import { useJob } from '@/lib/hooks/use-job';
import { useScreen } from '@/lib/hooks/use-screen';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { NewRequestForm } from '@/lib/ui/requests/new-request-form';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function NewRequest() {
  const { jobId, fromScreen } = useLocalSearchParams<{ jobId: string; fromScreen?: string }>();
  const { data: job, error, mutate } = useJob(jobId);
  const screen = useScreen(fromScreen);
  const problem = error ?? screen.error;
  if (problem) {
    return (
      <Screen title="New design request">
        <ErrorView error={problem} onRetry={() => void (error ? mutate() : screen.mutate())} />
      </Screen>
    );
  }
  if (!job || (fromScreen && !screen.data)) return <LoadingView />;
  return (
    <Screen title={`Design request: ${job.name}`} narrow>
      <TextLink href={`/jobs/${job.id}`} label="Back to the job" />
      <NewRequestForm job={job} fromScreen={fromScreen ? screen.data : undefined} />
    </Screen>
  );
}
