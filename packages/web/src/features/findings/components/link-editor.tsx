import { Button, Field, Input, makeStyles, Select, Text, tokens } from '@fluentui/react-components';
import { Add20Regular, Dismiss16Regular } from '@fluentui/react-icons';
import { FINDING_LINK_KINDS, type FindingLink, type FindingLinkKind } from '@tallyloom/core';
import { useId, useState } from 'react';
import { linkKindLabels, linkReferenceHints, linkText } from './labels';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  list: { margin: 0, paddingLeft: 0, listStyle: 'none' },
  item: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  adder: {
    display: 'grid',
    gridTemplateColumns: 'max-content 1fr max-content',
    alignItems: 'start',
    gap: tokens.spacingHorizontalS,
  },
  addButton: { marginTop: '26px' },
});

export interface LinkEditorProps {
  /** Links already saved with the finding: shown, never removed. */
  kept?: FindingLink[];
  /** Links to add with this save. */
  added: FindingLink[];
  onChange: (added: FindingLink[]) => void;
  /** The server's word on a link, e.g. "There is no audit sample 12." */
  problem?: string;
}

/** The links of a finding: those it has, those to add, and a row to add one more. */
export function LinkEditor({ kept = [], added, onChange, problem }: LinkEditorProps) {
  const styles = useStyles();
  const headingId = useId();
  const [kind, setKind] = useState<FindingLinkKind>('trace');
  const [reference, setReference] = useState('');
  const [typedProblem, setTypedProblem] = useState<string>();

  const add = () => {
    const trimmed = reference.trim();
    if (!trimmed) {
      setTypedProblem('Type the reference first.');
      return;
    }
    setTypedProblem(undefined);
    if (![...kept, ...added].some((l) => l.kind === kind && l.reference === trimmed)) {
      onChange([...added, { kind, reference: trimmed }]);
    }
    setReference('');
  };

  return (
    <div className={styles.root} role="group" aria-labelledby={headingId}>
      <Text id={headingId} weight="semibold">
        Links
      </Text>
      {kept.length + added.length === 0 ? (
        <Text>None yet: link the trace, sample or record this finding is about.</Text>
      ) : (
        <ul className={styles.list}>
          {kept.map((link) => (
            <li key={`kept-${link.kind}-${link.reference}`} className={styles.item}>
              {linkText(link)}
            </li>
          ))}
          {added.map((link) => (
            <li key={`added-${link.kind}-${link.reference}`} className={styles.item}>
              {linkText(link)}
              <Button
                appearance="subtle"
                size="small"
                icon={<Dismiss16Regular />}
                aria-label={`Do not add ${linkText(link)}`}
                onClick={() => onChange(added.filter((other) => other !== link))}
              />
            </li>
          ))}
        </ul>
      )}
      <div className={styles.adder}>
        <Field label="Kind">
          <Select value={kind} onChange={(_event, data) => setKind(data.value as FindingLinkKind)}>
            {FINDING_LINK_KINDS.map((option) => (
              <option key={option} value={option}>
                {linkKindLabels[option]}
              </option>
            ))}
          </Select>
        </Field>
        <Field
          label="Reference"
          hint={linkReferenceHints[kind]}
          validationMessage={typedProblem ?? problem}
        >
          <Input
            value={reference}
            autoComplete="off"
            onChange={(_event, data) => setReference(data.value)}
            onKeyDown={(event) => {
              // Enter adds the link instead of submitting the whole form.
              if (event.key === 'Enter') {
                event.preventDefault();
                add();
              }
            }}
          />
        </Field>
        <Button className={styles.addButton} icon={<Add20Regular />} onClick={add}>
          Add link
        </Button>
      </div>
    </div>
  );
}
