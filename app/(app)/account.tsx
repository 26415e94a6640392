import { useMe } from '@/lib/hooks/use-me';
import { AccountPanel } from '@/lib/ui/account-panel';
import { Screen } from '@/lib/ui/screen';

export default function Account() {
  const { data: me } = useMe();
  return <Screen title="Account">{me ? <AccountPanel me={me} /> : null}</Screen>;
}
