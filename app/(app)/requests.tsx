import { useMe } from '@/lib/hooks/use-me';
import { EmptyState } from '@/lib/ui/empty-state';
import { Notice } from '@/lib/ui/notice';
import { Screen } from '@/lib/ui/screen';

export default function Requests() {
  const { data: me } = useMe();
  return (
    <Screen title="Design requests">
      {me?.role === 'engineer' ? (
        <EmptyState
          testID="requests-empty"
          icon="requests"
          title="No design requests yet"
          body="Design requests sent to you will appear here, each with the job’s details, loads, photos and the contractor’s questions."
        />
      ) : (
        <Notice tone="info" title="For engineers">
          This inbox is for engineers: it lists the design requests sent to them.
        </Notice>
      )}
    </Screen>
  );
}
