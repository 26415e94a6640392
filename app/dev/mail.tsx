import { useLocalSearchParams } from 'expo-router';
import { MailList } from '@/lib/ui/mail-list';
import { Screen } from '@/lib/ui/screen';
import { TextLink } from '@/lib/ui/text-link';

export default function DevMail() {
  const { key } = useLocalSearchParams<{ key?: string }>();
  return (
    <Screen title="Captured mail">
      <TextLink href="/" label="Back to Tributary" />
      <MailList mailKey={key ?? ''} />
    </Screen>
  );
}
