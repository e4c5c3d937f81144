import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import { Checkmark20Regular, Edit20Regular } from '@fluentui/react-icons';
import { can, type FindingView } from '@tallyloom/core';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { FactList } from '@/components/ui/fact-list';
import { RouterLink } from '@/components/ui/router-link';
import { SectionHeading } from '@/components/ui/section-heading';
import { useNotify } from '@/components/ui/app-toaster';
import { formatDateTime } from '@/lib/format';
import { useSessionUser } from '@/lib/session/use-session';
import { useCloseFinding } from '../api/close-finding';
import { EditFindingDialog } from './edit-finding-dialog';
import { FindingStatusBadge, SeverityBadge } from './finding-badges';
import { linkHref, linkText } from './labels';
import { ResponseForm } from './response-form';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
  text: { margin: 0, whiteSpace: 'pre-wrap', maxWidth: '72ch' },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL },
  responses: {
    margin: 0,
    paddingLeft: 0,
    listStyle: 'none',
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
  },
  response: {
    borderLeft: `3px solid ${tokens.colorBrandStroke1}`,
    paddingLeft: tokens.spacingHorizontalM,
    maxWidth: '72ch',
  },
  meta: { color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase200 },
});

export interface FindingDetailProps {
  finding: FindingView;
}

/** The finding, what it points at, the responses in order, and the actions the person may take. */
export function FindingDetail({ finding }: FindingDetailProps) {
  const styles = useStyles();
  const user = useSessionUser();
  const notify = useNotify();
  const closeFinding = useCloseFinding();
  const [editing, setEditing] = useState(false);
  const [confirmingClose, setConfirmingClose] = useState(false);
  const closed = finding.status === 'closed';
  const mayWrite = can(user?.role, 'findings.write') && !closed;
  const mayEdit = mayWrite && user?.id === finding.createdById;
  const mayRespond = can(user?.role, 'findings.respond') && !closed;

  const close = () =>
    closeFinding.mutate(
      { id: finding.id, version: finding.version },
      {
        onSuccess: () => {
          setConfirmingClose(false);
          notify('Finding closed.');
        },
      },
    );

  return (
    <div className={styles.root}>
      {mayWrite ? (
        <div className={styles.actions}>
          {mayEdit ? (
            <Button icon={<Edit20Regular />} onClick={() => setEditing(true)}>
              Edit
            </Button>
          ) : null}
          <Button icon={<Checkmark20Regular />} onClick={() => setConfirmingClose(true)}>
            Close finding
          </Button>
        </div>
      ) : null}

      <FactList
        rows={[
          ['Severity', <SeverityBadge key="severity" severity={finding.severity} />],
          ['Status', <FindingStatusBadge key="status" status={finding.status} />],
          ['Written by', finding.createdBy],
          ['Written', formatDateTime(finding.createdAt)],
          ['Last changed', formatDateTime(finding.updatedAt)],
          ...(finding.closedAt
            ? ([['Closed', formatDateTime(finding.closedAt)]] as Array<[string, string]>)
            : []),
        ]}
      />

      <section aria-labelledby="finding-text">
        <SectionHeading id="finding-text">What was found</SectionHeading>
        <Text as="p" className={styles.text}>
          {finding.body}
        </Text>
      </section>

      <section aria-labelledby="finding-links">
        <SectionHeading id="finding-links">Links</SectionHeading>
        {finding.links.length === 0 ? (
          <Text as="p">This finding links to no trace, sample or record.</Text>
        ) : (
          <ul className={styles.list}>
            {finding.links.map((link) => (
              <li key={`${link.kind}-${link.reference}`}>
                <RouterLink to={linkHref(link)}>{linkText(link)}</RouterLink>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="finding-responses">
        <SectionHeading id="finding-responses">Responses</SectionHeading>
        {finding.responses.length === 0 ? (
          <Text as="p">{closed ? 'It was closed without a response.' : 'No response yet.'}</Text>
        ) : (
          <ol className={styles.responses} aria-label="Responses, oldest first">
            {finding.responses.map((response) => (
              <li key={response.id} className={styles.response}>
                <Text as="p" className={styles.meta}>
                  {response.respondedBy} · {formatDateTime(response.respondedAt)}
                </Text>
                <Text as="p" className={styles.text}>
                  {response.body}
                </Text>
              </li>
            ))}
          </ol>
        )}
        {mayRespond ? <ResponseForm findingId={finding.id} /> : null}
      </section>

      {mayEdit ? (
        <EditFindingDialog open={editing} finding={finding} onClose={() => setEditing(false)} />
      ) : null}
      <ConfirmDialog
        open={confirmingClose}
        title="Close this finding?"
        confirmLabel="Close finding"
        pendingLabel="Closing…"
        pending={closeFinding.isPending}
        error={closeFinding.error?.message}
        onConfirm={close}
        onClose={() => {
          closeFinding.reset();
          setConfirmingClose(false);
        }}
      >
        A closed finding can no longer be edited or answered. It stays in the list with its
        responses.
      </ConfirmDialog>
    </div>
  );
}
