import { useLocalSearchParams } from 'expo-router';
import { useRequest } from '@/lib/hooks/use-design-requests';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { RequestView } from '@/lib/ui/requests/request-view';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function RequestPage() {
  const { requestId } = useLocalSearchParams<{ requestId: string }>();
  const { data: request, error, mutate } = useRequest(requestId);
  if (error) {
    return (
      <Screen title="Design request">
        <ErrorView error={error} onRetry={() => mutate()} />
        <TextLink href="/requests" label="All requests" />
      </Screen>
    );
  }
  if (!request) return <LoadingView />;
  return (
    <Screen title={`Request ${request.number} · ${request.jobName}`}>
      <TextLink
        href={request.viewer === 'firm' ? `/jobs/${request.jobId}` : '/requests'}
        label={request.viewer === 'firm' ? 'Back to the job' : 'All requests'}
      />
      <RequestView request={request} onChange={(detail) => void mutate(detail, { revalidate: false })} />
    </Screen>
  );
}
