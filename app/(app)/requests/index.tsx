import { useMe } from '@/lib/hooks/use-me';
import { RequestInbox } from '@/lib/ui/requests/request-inbox';
import { Screen } from '@/lib/ui/screen';

export default function Requests() {
  const { data: me } = useMe();
  return (
    <Screen title="Design requests">{me ? <RequestInbox engineer={me.role === 'engineer'} /> : null}</Screen>
  );
}
