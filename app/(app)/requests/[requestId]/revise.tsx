import { useLocalSearchParams } from 'expo-router';
import { useRequest } from '@/lib/hooks/use-design-requests';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { Notice } from '@/lib/ui/notice';
import { RevisionEditor } from '@/lib/ui/requests/revision-editor';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';
import { REQUEST_STATE_LABELS } from '@/shared/schemas/requests/workflow';

export default function ReviseRequestPage() {
  const { requestId } = useLocalSearchParams<{ requestId: string }>();
  const { data: request, error, mutate } = useRequest(requestId);
  if (error) {
    return (
      <Screen title="Revise the request">
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
  const allowed = request.actions.includes('revise') || request.actions.includes('reopen');
  if (!allowed || request.viewer !== 'firm') {
    return (
      <Screen title={`Request ${request.number}`} narrow>
        {back}
        <Notice tone="info" title="No revision now" testID="revision-closed">
          {request.status === 'draft'
            ? 'This request is not sent yet: edit the draft from its page.'
            : `A request that is ${REQUEST_STATE_LABELS[request.status]} cannot be revised.`}
        </Notice>
      </Screen>
    );
  }
  return (
    <Screen title={`Revise and send: request ${request.number} · ${request.jobName}`} narrow>
      {back}
      <RevisionEditor request={request} onChange={(detail) => void mutate(detail, { revalidate: false })} />
    </Screen>
  );
}
