import { useNavigate, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { AcceptInvitation } from '@/features/auth/components/accept-invitation';

export function AcceptInvitationRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="Welcome to Tallyloom" />
      <AcceptInvitation
        token={searchParams.get('token')}
        onAccepted={() => void navigate(paths.network.getHref(), { replace: true })}
      />
    </>
  );
}
