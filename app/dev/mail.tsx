import { MailList } from '@/lib/ui/mail-list';
import { Screen } from '@/lib/ui/screen';

export default function DevMail() {
  return (
    <Screen title="Captured mail">
      <MailList />
    </Screen>
  );
}
