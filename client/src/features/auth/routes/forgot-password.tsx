import { useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../components/auth-layout';
import { ForgotPasswordForm } from '../components/forgot-password-form';

export function ForgotPasswordRoute() {
  const [params] = useSearchParams();
  return (
    <AuthLayout
      title="Forgot your password?"
      description="Enter your e-mail address and we will send a link to choose a new password."
    >
      <ForgotPasswordForm initialEmail={params.get('email') ?? ''} />
    </AuthLayout>
  );
}
