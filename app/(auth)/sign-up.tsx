import { AuthFrame } from '@/lib/ui/auth-frame';
import { SignUpForm } from '@/lib/ui/sign-up-form';

export default function SignUp() {
  return (
    <AuthFrame title="Create your account">
      <SignUpForm />
    </AuthFrame>
  );
}
