import { useLocalSearchParams } from 'expo-router';
import { useJob } from '@/lib/hooks/use-job';
import { CautionNote } from '@/lib/ui/caution-note';
import { ErrorView } from '@/lib/ui/error-view';
import { ExistingFramingEditor } from '@/lib/ui/load-path/existing-framing-editor';
import { LoadingView } from '@/lib/ui/loading-view';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function ExistingFramingPage() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const job = useJob(jobId);
  if (job.error) return <ErrorView error={job.error} onRetry={() => void job.mutate()} />;
  if (!job.data) return <LoadingView />;
  return (
    <Screen title="Existing framing">
      <TextLink href={`/jobs/${jobId}`} label={`Back to ${job.data.name}`} />
      <ExistingFramingEditor job={job.data} />
      <CautionNote />
    </Screen>
  );
}
