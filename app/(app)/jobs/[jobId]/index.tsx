import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import type { MemberRecompute } from '@/shared/schemas/job-update';
import { useJob } from '@/lib/hooks/use-job';
import { useJobMutations } from '@/lib/hooks/use-job-mutations';
import { ArchiveJobControl } from '@/lib/ui/archive-job-control';
import { ChecklistPanel } from '@/lib/ui/bearing/checklist-panel';
import { JobScreensPanel } from '@/lib/ui/bearing/job-screens-panel';
import { ShoringPanel } from '@/lib/ui/bearing/shoring-panel';
import { Button } from '@/lib/ui/button';
import { ErrorView } from '@/lib/ui/error-view';
import { jobToDraft } from '@/lib/ui/job-draft';
import { JobForm } from '@/lib/ui/job-form';
import { JobMembersPanel } from '@/lib/ui/job-members-panel';
import { JobSummary } from '@/lib/ui/job-summary';
import { JobRequestsPanel } from '@/lib/ui/requests/job-requests-panel';
import { LoadingView } from '@/lib/ui/loading-view';
import { DeviceMark } from '@/lib/ui/offline/device-mark';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function JobPage() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const { data: job, error, mutate } = useJob(jobId);
  const { update, archive } = useJobMutations();
  const [editing, setEditing] = useState(false);
  const [recomputed, setRecomputed] = useState<MemberRecompute[]>([]);

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
      // Keys apart, so the page opens at its top after a save (where the members checked again are named).
      <Screen key="edit" title={`Edit ${job.name}`} narrow>
        <JobForm
          initial={jobToDraft(job)}
          submitLabel="Save changes"
          onSubmit={async (fields) => {
            setRecomputed(await update(job, fields));
            setEditing(false);
          }}
          onCancel={() => setEditing(false)}
        />
      </Screen>
    );
  }

  return (
    <Screen
      key="view"
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
      <DeviceMark recordId={job.id} />
      <JobScreensPanel jobId={job.id} />
      <JobMembersPanel job={job} recomputed={recomputed} />
      <TextLink href={`/jobs/${job.id}/budget`} label="Job budget" />
      <JobRequestsPanel job={job} />
      <ShoringPanel jobId={job.id} />
      <ChecklistPanel jobId={job.id} />
      <JobSummary job={job} />
      <ArchiveJobControl jobName={job.name} onArchive={() => archive(job.id)} />
    </Screen>
  );
}
