import { AuthFrame } from '@/lib/ui/auth-frame';
import { ForgotPasswordForm } from '@/lib/ui/forgot-password-form';

export default function ForgotPassword() {
  return (
    <AuthFrame title="Forgot your password?">
      <ForgotPasswordForm />
    </AuthFrame>
  );
}
