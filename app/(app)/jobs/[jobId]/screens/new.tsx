import { useLocalSearchParams } from 'expo-router';
import { useMe } from '@/lib/hooks/use-me';
import { useScreenSave } from '@/lib/hooks/use-screen-save';
import { LazyScreenWizard, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';
import { LoadingView } from '@/lib/ui/loading-view';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

/** One object for the life of the page, so the wizard's first answers keep their identity. */
const NO_ANSWERS = {};

export default function NewBearingScreenPage() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const save = useScreenSave(jobId);
  const { data: me } = useMe();
  if (!me) return <LoadingView />;
  return (
    <Screen title="Bearing screen" narrow>
      <TextLink href={{ pathname: '/jobs/[jobId]', params: { jobId } }} label="Back to the job" />
      <WorkspaceSuspense>
        <LazyScreenWizard
          initialLabel=""
          initialAnswers={NO_ANSWERS}
          storageKey={`${me.user.id}.${jobId}.screen-new`}
          onSave={save}
        />
      </WorkspaceSuspense>
    </Screen>
  );
}
