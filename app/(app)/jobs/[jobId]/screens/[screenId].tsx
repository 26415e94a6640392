import { useLocalSearchParams, useRouter } from 'expo-router';
import { useScreen } from '@/lib/hooks/use-screen';
import { useMe } from '@/lib/hooks/use-me';
import { useScreenSave } from '@/lib/hooks/use-screen-save';
import { Button } from '@/lib/ui/button';
import { ErrorView } from '@/lib/ui/error-view';
import { LazyScreenOutcome, LazyScreenWizard, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';
import { LoadingView } from '@/lib/ui/loading-view';
import { DeviceMark } from '@/lib/ui/offline/device-mark';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function BearingScreenPage() {
  const { jobId, screenId, edit } = useLocalSearchParams<{
    jobId: string;
    screenId: string;
    edit?: string;
  }>();
  const { data: screen, error, mutate } = useScreen(screenId);
  const save = useScreenSave(jobId, screen);
  const router = useRouter();
  const { data: me } = useMe();
  if (error) return <ErrorView error={error} onRetry={() => mutate()} />;
  if (!screen || !me) return <LoadingView />;
  const back = <TextLink href={{ pathname: '/jobs/[jobId]', params: { jobId } }} label="Back to the job" />;
  if (edit === '1') {
    return (
      <Screen title={`Screen again: ${screen.wallLabel}`} narrow>
        {back}
        <WorkspaceSuspense>
          <LazyScreenWizard
            initialLabel={screen.wallLabel}
            initialAnswers={screen.answers}
            storageKey={`${me.user.id}.${jobId}.screen-${screen.id}`}
            onSave={save}
          />
        </WorkspaceSuspense>
      </Screen>
    );
  }
  return (
    <Screen
      title={screen.wallLabel}
      actions={
        <Button
          label="Answer again"
          icon="edit"
          variant="secondary"
          onPress={() => router.setParams({ edit: '1' })}
          testID="screen-edit"
        />
      }
    >
      {back}
      <DeviceMark recordId={screen.id} />
      <WorkspaceSuspense>
        <LazyScreenOutcome screen={screen} />
      </WorkspaceSuspense>
    </Screen>
  );
}
