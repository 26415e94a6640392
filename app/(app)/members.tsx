import { useMe } from '@/lib/hooks/use-me';
import { MembersPanel } from '@/lib/ui/members-panel';
import { Notice } from '@/lib/ui/notice';
import { Screen } from '@/lib/ui/screen';

export default function Members() {
  const { data: me } = useMe();
  return (
    <Screen title="Members">
      {me?.role === 'owner' ? (
        <MembersPanel />
      ) : (
        <Notice tone="info" title="Owner only" testID="members-owner-only">
          Only the firm’s owner can see the member list and invite people. Ask your firm’s owner to add
          someone.
        </Notice>
      )}
    </Screen>
  );
}
