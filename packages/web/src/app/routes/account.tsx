import { PageHeader } from '@/components/ui/page-header';
import { AccountOverview } from '@/features/auth/components/account-overview';

export function AccountRoute() {
  return (
    <>
      <PageHeader
        title="My account"
        description="Who you are in Tallyloom, which part of the network you see, and your password."
      />
      <AccountOverview />
    </>
  );
}
