import { useLocalSearchParams } from 'expo-router';
import { useScreenSave } from '@/lib/hooks/use-screen-save';
import { LazyScreenWizard, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function NewBearingScreenPage() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const save = useScreenSave(jobId);
  return (
    <Screen title="Bearing screen" narrow>
      <TextLink href={{ pathname: '/jobs/[jobId]', params: { jobId } }} label="Back to the job" />
      <WorkspaceSuspense>
        <LazyScreenWizard initialLabel="" initialAnswers={{}} onSave={save} />
      </WorkspaceSuspense>
    </Screen>
  );
}
