import { useLocalSearchParams } from 'expo-router';
import { EmailConfirmationView } from '@/lib/ui/email-confirmation-view';

export default function VerifyEmail() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <EmailConfirmationView token={token} />;
}
