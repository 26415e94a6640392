import { useRouter } from 'expo-router';
import { useJobMutations } from '@/lib/hooks/use-job-mutations';
import { emptyJobDraft } from '@/lib/ui/job-draft';
import { JobForm } from '@/lib/ui/job-form';
import { Screen } from '@/lib/ui/screen';

export default function NewJob() {
  const { create } = useJobMutations();
  const router = useRouter();
  return (
    <Screen title="New job" narrow>
      <JobForm
        initial={emptyJobDraft()}
        submitLabel="Create job"
        onSubmit={create}
        onCancel={() => router.back()}
      />
    </Screen>
  );
}
