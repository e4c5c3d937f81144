import { useNavigate, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { ResetPassword } from '@/features/auth/components/reset-password';

export function ResetPasswordRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="Choose a new password" />
      <ResetPassword
        token={searchParams.get('token')}
        onReset={() =>
          void navigate(paths.signIn.getHref({ notice: 'password-changed' }), { replace: true })
        }
      />
    </>
  );
}
