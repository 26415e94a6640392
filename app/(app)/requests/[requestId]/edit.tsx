import { useLocalSearchParams } from 'expo-router';
import { useRequest } from '@/lib/hooks/use-design-requests';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { Notice } from '@/lib/ui/notice';
import { DraftEditor } from '@/lib/ui/requests/draft-editor';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function EditRequestPage() {
  const { requestId } = useLocalSearchParams<{ requestId: string }>();
  const { data: request, error, mutate } = useRequest(requestId);
  if (error) {
    return (
      <Screen title="Edit the draft">
        <ErrorView error={error} onRetry={() => mutate()} />
      </Screen>
    );
  }
  if (!request) return <LoadingView />;
  const back = (
    <TextLink
      href={{ pathname: '/requests/[requestId]', params: { requestId } }}
      label="Back to the request"
    />
  );
  if (request.status !== 'draft' || !request.actions.includes('edit')) {
    return (
      <Screen title={`Request ${request.number}`} narrow>
        {back}
        <Notice tone="info" title="Sent already" testID="draft-edit-closed">
          A sent request keeps what it was sent with. Change it with “Revise and send” on the request’s page.
        </Notice>
      </Screen>
    );
  }
  return (
    <Screen title={`Edit the draft: request ${request.number} · ${request.jobName}`} narrow>
      {back}
      <DraftEditor request={request} onChange={(detail) => void mutate(detail, { revalidate: false })} />
    </Screen>
  );
}
