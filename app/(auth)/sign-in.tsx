import { AuthFrame } from '@/lib/ui/auth-frame';
import { SignInForm } from '@/lib/ui/sign-in-form';

export default function SignIn() {
  return (
    <AuthFrame title="Sign in">
      <SignInForm />
    </AuthFrame>
  );
}
