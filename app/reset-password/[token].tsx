import { useLocalSearchParams } from 'expo-router';
import { AuthFrame } from '@/lib/ui/auth-frame';
import { ResetPasswordForm } from '@/lib/ui/reset-password-form';

export default function ResetPassword() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return (
    <AuthFrame title="Set a new password">
      <ResetPasswordForm token={token} />
    </AuthFrame>
  );
}
