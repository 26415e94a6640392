import { useJobProgress } from '@/lib/hooks/use-job-progress';
import { useJobs } from '@/lib/hooks/use-jobs';
import { ErrorView } from '@/lib/ui/error-view';
import { JobRow } from '@/lib/ui/job-row';
import { JobsEmptyState } from '@/lib/ui/jobs-empty-state';
import { LinkButton } from '@/lib/ui/link-button';
import { LoadingView } from '@/lib/ui/loading-view';
import { Screen } from '@/lib/ui/screen';

export default function Jobs() {
  const { data: jobs, error, mutate } = useJobs();
  const { data: progress } = useJobProgress();
  const newJob = jobs?.length ? (
    <LinkButton href="/jobs/new" label="New job" icon="plus" testID="jobs-new" />
  ) : null;

  return (
    <Screen title="Jobs" actions={newJob}>
      {error ? (
        <ErrorView error={error} onRetry={() => mutate()} />
      ) : !jobs ? (
        <LoadingView />
      ) : jobs.length === 0 ? (
        <JobsEmptyState />
      ) : (
        jobs.map((job) => (
          <JobRow key={job.id} job={job} progress={progress?.find((p) => p.jobId === job.id)} />
        ))
      )}
    </Screen>
  );
}
