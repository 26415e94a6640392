import { useJobRequests } from '@/lib/hooks/use-design-requests';
import type { Job } from '@/shared/schemas/jobs';
import { Card } from '../card';
import { ErrorView } from '../error-view';
import { LinkButton } from '../link-button';
import { Text } from '../text';
import { RequestRow } from './request-row';

/** The job's design requests and "New design request". */
export function JobRequestsPanel({ job }: { job: Job }) {
  const { data, error, mutate } = useJobRequests(job.id);
  return (
    <Card title="Design requests" testID="job-requests">
      {error ? <ErrorView error={error} onRetry={() => mutate()} /> : null}
      {data?.length === 0 ? (
        <Text tone="muted">None yet. Every result here is preliminary: send it to an engineer.</Text>
      ) : null}
      {(data ?? []).map((request) => (
        <RequestRow key={request.id} request={request} showFirm={false} />
      ))}
      {!job.archivedAt ? (
        <LinkButton
          href={`/jobs/${job.id}/requests/new`}
          label="New design request"
          icon="requests"
          variant="secondary"
          testID="new-request"
        />
      ) : null}
    </Card>
  );
}
