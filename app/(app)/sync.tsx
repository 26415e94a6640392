import { Screen } from '@/lib/ui/screen';
import { SyncView } from '@/lib/ui/offline/sync-view';

export default function SyncPage() {
  return (
    <Screen title="Sync">
      <SyncView />
    </Screen>
  );
}
