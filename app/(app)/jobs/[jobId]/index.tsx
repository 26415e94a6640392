import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { useJob } from '@/lib/hooks/use-job';
import { useJobMutations } from '@/lib/hooks/use-job-mutations';
import { ArchiveJobControl } from '@/lib/ui/archive-job-control';
import { Button } from '@/lib/ui/button';
import { ErrorView } from '@/lib/ui/error-view';
import { jobToDraft } from '@/lib/ui/job-draft';
import { JobForm } from '@/lib/ui/job-form';
import { JobMembersPanel } from '@/lib/ui/job-members-panel';
import { JobSummary } from '@/lib/ui/job-summary';
import { LoadingView } from '@/lib/ui/loading-view';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function JobPage() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const { data: job, error, mutate } = useJob(jobId);
  const { update, archive } = useJobMutations();
  const [editing, setEditing] = useState(false);

  if (error) {
    return (
      <Screen title="Job">
        <ErrorView error={error} onRetry={() => mutate()} />
        <TextLink href="/jobs" label="Back to Jobs" />
      </Screen>
    );
  }
  if (!job) return <LoadingView />;

  if (editing) {
    return (
      <Screen title={`Edit ${job.name}`} narrow>
        <JobForm
          initial={jobToDraft(job)}
          submitLabel="Save changes"
          onSubmit={async (fields) => {
            await update(job.id, fields);
            setEditing(false);
          }}
          onCancel={() => setEditing(false)}
        />
      </Screen>
    );
  }

  return (
    <Screen
      title={job.name}
      actions={
        <Button
          label="Edit"
          icon="edit"
          variant="secondary"
          testID="job-edit"
          onPress={() => setEditing(true)}
        />
      }
    >
      <TextLink href="/jobs" label="All jobs" />
      <JobMembersPanel job={job} />
      <TextLink href={`/jobs/${job.id}/budget`} label="Job budget" />
      <JobSummary job={job} />
      <ArchiveJobControl jobName={job.name} onArchive={() => archive(job.id)} />
    </Screen>
  );
}
