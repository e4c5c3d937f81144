import type { OneTimeLinkInfo } from '@tallyloom/core';
import type { ReactNode } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ApiError } from '@/lib/api-client';
import { useOneTimeLink } from '../api/get-one-time-link';

export interface OneTimeLinkGateProps {
  token: string | null;
  purpose: OneTimeLinkInfo['purpose'];
  /** What to do instead when the link no longer works, e.g. ask for a new one. */
  whenInvalid: ReactNode;
  children: (link: OneTimeLinkInfo) => ReactNode;
}

function InvalidLink({ reason, children }: { reason: string; children: ReactNode }) {
  return (
    <EmptyState title="This link is no longer valid">
      {reason} {children}
    </EmptyState>
  );
}

/** Checks an invitation or reset link before asking for a password, and says who it is for. */
export function OneTimeLinkGate({ token, purpose, whenInvalid, children }: OneTimeLinkGateProps) {
  if (!token) {
    return (
      <InvalidLink reason="The address has no link code in it; it may have been cut short when it was copied.">
        {whenInvalid}
      </InvalidLink>
    );
  }
  return (
    <CheckedLink token={token} purpose={purpose} whenInvalid={whenInvalid}>
      {children}
    </CheckedLink>
  );
}

function CheckedLink({
  token,
  purpose,
  whenInvalid,
  children,
}: OneTimeLinkGateProps & { token: string }) {
  const link = useOneTimeLink(token);

  if (link.isPending) return <LoadingState label="Checking your link…" />;

  if (link.isError) {
    if (link.error instanceof ApiError && link.error.statusCode === 404) {
      return <InvalidLink reason={link.error.message}>{whenInvalid}</InvalidLink>;
    }
    return (
      <ErrorState
        title="The link could not be checked"
        error={link.error}
        onRetry={() => void link.refetch()}
        retrying={link.isFetching}
      />
    );
  }

  if (link.data.purpose !== purpose) {
    const meantFor = link.data.purpose === 'invitation' ? 'an invitation' : 'a password reset';
    return (
      <InvalidLink reason={`This link is for ${meantFor}, not for this page.`}>
        {whenInvalid}
      </InvalidLink>
    );
  }

  return children(link.data);
}
