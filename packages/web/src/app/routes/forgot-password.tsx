import { PageHeader } from '@/components/ui/page-header';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';

export function ForgotPasswordRoute() {
  return (
    <>
      <PageHeader
        title="Forgot your password?"
        description="Enter the address you sign in with, and we will e-mail you a link to choose a new password."
      />
      <ForgotPasswordForm />
    </>
  );
}
