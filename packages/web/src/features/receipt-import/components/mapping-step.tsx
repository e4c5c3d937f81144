import {
  Button,
  Field,
  makeStyles,
  Select,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import type { BlanketSizeView, ImportCell, ImportUploadResponse } from '@tallyloom/core';
import { useMemo, useState } from 'react';
import { FormAlert } from '@/components/ui/form-alert';
import { SectionHeading } from '@/components/ui/section-heading';
import type { ImportMapping } from '../api/preview-import';
import { asField, fieldLabel, fieldOptions } from './field-labels';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(240px, 1fr))',
    gap: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalL}`,
  },
  sample: { overflowX: 'auto', maxWidth: '100%' },
  headerCell: { fontWeight: tokens.fontWeightSemibold, whiteSpace: 'nowrap' },
  headerRow: { backgroundColor: tokens.colorNeutralBackground2 },
  empty: { color: tokens.colorNeutralForeground3 },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS, flexWrap: 'wrap' },
});

/** A cell as shown in the sample: numbers as numbers, empty as a dash. */
export function cellText(value: ImportCell | undefined): string {
  if (value === null || value === undefined || value === '') return '—';
  return String(value);
}

/** Mistakes in the mapping the server would refuse: a field filled twice, no date column. */
export function mappingProblems(
  mapping: ImportMapping,
  sizes: BlanketSizeView[],
): { columns: Record<string, string>; general: string[] } {
  const columns: Record<string, string> = {};
  const firstFrom = new Map<string, string>();
  for (const [header, field] of Object.entries(mapping)) {
    if (!field) continue;
    const earlier = firstFrom.get(field);
    if (earlier === undefined) firstFrom.set(field, header);
    else
      columns[header] =
        `${fieldLabel(field, sizes)} is already filled from column “${earlier}”. Choose another field, or “Don't import”.`;
  }
  const general = firstFrom.has('receivedOn')
    ? []
    : ['Match one column to “Received on”, the date each parcel arrived.'];
  return { columns, general };
}

export interface MappingStepProps {
  upload: ImportUploadResponse;
  sizes: BlanketSizeView[];
  mapping: ImportMapping;
  onMappingChange: (mapping: ImportMapping) => void;
  onCheck: () => void;
  onBack: () => void;
}

/** Step 2: which field each column of the sheet fills, prefilled with the server's guess. */
export function MappingStep({
  upload,
  sizes,
  mapping,
  onMappingChange,
  onCheck,
  onBack,
}: MappingStepProps) {
  const styles = useStyles();
  const [submitted, setSubmitted] = useState(false);
  const options = useMemo(
    () => fieldOptions(sizes, Object.values(upload.suggestedMapping)),
    [sizes, upload.suggestedMapping],
  );
  const problems = mappingProblems(mapping, sizes);
  const blocked = Object.keys(problems.columns).length > 0 || problems.general.length > 0;

  return (
    <div className={styles.root}>
      <Text as="p">
        Choose the field each column of your sheet fills. Columns set to “Don&apos;t import” are
        left out.
      </Text>
      {submitted ? <FormAlert messages={problems.general} /> : null}
      <div className={styles.grid}>
        {upload.headers.map((header) => {
          const first = upload.sampleRows[0]?.[header];
          return (
            <Field
              key={header}
              label={header}
              validationMessage={problems.columns[header]}
              hint={first === undefined ? undefined : `First value: ${cellText(first)}`}
            >
              <Select
                value={mapping[header] ?? ''}
                onChange={(_event, data) =>
                  onMappingChange({ ...mapping, [header]: asField(data.value, options) })
                }
              >
                <option value="">Don&apos;t import</option>
                {options.map((option) => (
                  <option key={option.value} value={option.value}>
                    {option.label}
                  </option>
                ))}
              </Select>
            </Field>
          );
        })}
      </div>

      <section aria-labelledby="import-sample-heading">
        <SectionHeading id="import-sample-heading">
          The first {upload.sampleRows.length === 1 ? 'row' : `${upload.sampleRows.length} rows`} of{' '}
          {upload.fileName}
        </SectionHeading>
        <div className={styles.sample}>
          <Table size="extra-small" aria-labelledby="import-sample-heading">
            <TableHeader>
              <TableRow className={styles.headerRow}>
                {upload.headers.map((header) => (
                  <TableHeaderCell key={header} className={styles.headerCell}>
                    {header}
                  </TableHeaderCell>
                ))}
              </TableRow>
            </TableHeader>
            <TableBody>
              {upload.sampleRows.map((row, index) => (
                // Sample rows have no id of their own; their order never changes.
                <TableRow key={index}>
                  {upload.headers.map((header) => (
                    <TableCell key={header}>
                      <span className={row[header] == null ? styles.empty : undefined}>
                        {cellText(row[header])}
                      </span>
                    </TableCell>
                  ))}
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </div>
      </section>

      <div className={styles.actions}>
        <Button
          appearance="primary"
          onClick={() => {
            setSubmitted(true);
            if (!blocked) onCheck();
          }}
        >
          Check rows
        </Button>
        <Button onClick={onBack}>Upload a different file</Button>
      </div>
    </div>
  );
}
