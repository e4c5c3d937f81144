import {
  Button,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Spinner,
  tokens,
} from '@fluentui/react-components';
import { ShieldCheckmark20Regular } from '@fluentui/react-icons';
import type { AuditVerificationView } from '@tallyloom/core';
import { ErrorState } from '@/components/ui/error-state';
import { formatCount, formatDateTime } from '@/lib/format';
import { useVerifyChain } from '../api/verify-chain';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    marginBottom: tokens.spacingVerticalL,
  },
  facts: { margin: 0, paddingLeft: tokens.spacingHorizontalL },
});

const REASONS: Record<string, string> = {
  'content-changed': 'An entry was changed after it was sealed',
  'link-changed': 'The chain was rewritten',
  missing: 'An entry is missing',
};

function VerificationResult({ result }: { result: AuditVerificationView }) {
  const styles = useStyles();
  const checked = `${formatCount(result.entriesChecked)} entries checked at ${formatDateTime(result.verifiedAt)}`;
  if (result.ok) {
    return (
      <MessageBar intent="success" role="status">
        <MessageBarBody>
          <MessageBarTitle>The chain holds</MessageBarTitle>
          No entry was changed, removed or reordered: {checked}.
        </MessageBarBody>
      </MessageBar>
    );
  }
  const link = result.firstBrokenLink!;
  return (
    <MessageBar intent="error" role="alert">
      <MessageBarBody>
        <MessageBarTitle>
          The chain is broken at entry #{formatCount(link.chainSeq)}
        </MessageBarTitle>
        <ul className={styles.facts}>
          <li>{REASONS[link.reason] ?? link.reason}.</li>
          <li>{link.message}</li>
          <li>
            {link.entryId === null
              ? 'The entry at that place is gone.'
              : `The entry's number is ${link.entryId}.`}
          </li>
          <li>{checked}; later entries were not checked.</li>
        </ul>
      </MessageBarBody>
    </MessageBar>
  );
}

/** The auditor's check: seals what is pending and recomputes every link of the chain. */
export function VerifyChainPanel({ mayVerify }: { mayVerify: boolean }) {
  const styles = useStyles();
  const verify = useVerifyChain();
  if (!mayVerify) return null;
  return (
    <div className={styles.root}>
      <div>
        <Button
          icon={verify.isPending ? <Spinner size="tiny" /> : <ShieldCheckmark20Regular />}
          disabledFocusable={verify.isPending}
          onClick={() => verify.mutate()}
        >
          {verify.isPending ? 'Verifying the chain…' : 'Verify the chain'}
        </Button>
      </div>
      {verify.isError && (
        <ErrorState title="The chain could not be verified" error={verify.error} headingLevel={3} />
      )}
      {verify.data && !verify.isPending && <VerificationResult result={verify.data} />}
    </div>
  );
}
