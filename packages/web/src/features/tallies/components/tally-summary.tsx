import {
  makeStyles,
  MessageBar,
  MessageBarBody,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  tokens,
} from '@fluentui/react-components';
import {
  PEOPLE_GROUP_LABELS,
  PEOPLE_GROUPS,
  SET_ASIDE_LABELS,
  SET_ASIDE_REASONS,
  type TallyDetail,
  type TallyValues,
} from '@tallyloom/core';
import type { ReactNode } from 'react';
import { FactList } from '@/components/ui/fact-list';
import { SectionHeading } from '@/components/ui/section-heading';
import { formatCount } from '@/lib/format';
import { yarnConversion } from './more-section';
import { isBabySize, SAFE_SLEEP_CAUTION } from './tally-labels';

type Row = [string, ReactNode];

const hours = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  section: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    breakInside: 'avoid',
  },
  columns: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(280px, 1fr))',
    gap: tokens.spacingHorizontalXXL,
  },
  numeric: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  // A header cell lays its text out in an inner box: push that to the right as well.
  numericHead: { justifyContent: 'flex-end' },
  none: { margin: 0, color: tokens.colorNeutralForeground2 },
  notes: { margin: 0, whiteSpace: 'pre-wrap' },
});

export interface TallySummaryProps {
  values: TallyValues;
  detail: Pick<TallyDetail, 'checkContext' | 'agencies'>;
}

/** The tally's figures to read and print: no boxes, every number right-aligned. */
export function TallySummary({ values, detail }: TallySummaryProps) {
  const styles = useStyles();
  const sizeName = (id: number) =>
    detail.checkContext.blanketSizes.find((size) => size.id === id)?.name ?? `Size ${id}`;
  const agencyName = (id: number) =>
    detail.agencies.find((agency) => agency.id === id)?.name ?? `Agency ${id}`;
  const count = (value: number) => <span className={styles.numeric}>{formatCount(value)}</span>;
  const agenciesServed = [...new Set(values.peopleServed.map((line) => line.partnerAgencyId))];
  const served = (agencyId: number, group: (typeof PEOPLE_GROUPS)[number]) =>
    values.peopleServed
      .filter((line) => line.partnerAgencyId === agencyId && line.group === group)
      .reduce((sum, line) => sum + line.count, 0);
  const babyGiven = values.blankets.given.some((line) => isBabySize(sizeName(line.blanketSizeId)));

  return (
    <div className={styles.root}>
      <div className={styles.columns}>
        <section className={styles.section} aria-labelledby="summary-panels">
          <SectionHeading id="summary-panels">Panels</SectionHeading>
          <FactList
            rows={[
              ['Opening stock', count(values.panels.opening)],
              ['Accepted', count(values.panels.accepted)],
              ['Used in assembly', count(values.panels.usedInAssembly)],
              ['Closing stock', count(values.panels.closing)],
              ...SET_ASIDE_REASONS.map(
                (reason) =>
                  [
                    `Set aside: ${SET_ASIDE_LABELS[reason]}`,
                    count(values.panels.setAside[reason]),
                  ] as Row,
              ),
              ...(values.receiptsDifferenceReason
                ? [['Why accepted differs from receipts', values.receiptsDifferenceReason] as Row]
                : []),
            ]}
          />
        </section>
        <section className={styles.section} aria-labelledby="summary-blankets">
          <SectionHeading id="summary-blankets">Blankets</SectionHeading>
          <FactList
            rows={[
              ['Opening stock', count(values.blankets.opening)],
              ...values.blankets.assembled.map(
                (line) => [`Assembled: ${sizeName(line.blanketSizeId)}`, count(line.count)] as Row,
              ),
              ['Finished blankets received', count(values.blankets.received)],
              [
                'Given out',
                count(values.blankets.given.reduce((sum, line) => sum + line.count, 0)),
              ],
              ['Closing stock', count(values.blankets.closing)],
            ]}
          />
        </section>
      </div>

      <section className={styles.section} aria-labelledby="summary-given">
        <SectionHeading id="summary-given">Blankets given out</SectionHeading>
        {values.blankets.given.length === 0 ? (
          <Text as="p" className={styles.none}>
            None this month.
          </Text>
        ) : (
          <Table size="small" aria-labelledby="summary-given">
            <TableHeader>
              <TableRow>
                <TableHeaderCell>Blanket size</TableHeaderCell>
                <TableHeaderCell>Partner agency</TableHeaderCell>
                <TableHeaderCell
                  className={styles.numeric}
                  button={{ className: styles.numericHead }}
                >
                  Blankets
                </TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {values.blankets.given.map((line) => (
                <TableRow key={`${line.blanketSizeId}/${line.partnerAgencyId}`}>
                  <TableCell>{sizeName(line.blanketSizeId)}</TableCell>
                  <TableCell>{agencyName(line.partnerAgencyId)}</TableCell>
                  <TableCell className={styles.numeric}>{formatCount(line.count)}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        )}
        {babyGiven ? (
          <MessageBar intent="info" layout="multiline">
            <MessageBarBody>{SAFE_SLEEP_CAUTION}</MessageBarBody>
          </MessageBar>
        ) : null}
      </section>

      <section className={styles.section} aria-labelledby="summary-people">
        <SectionHeading id="summary-people">People served</SectionHeading>
        {agenciesServed.length === 0 ? (
          <Text as="p" className={styles.none}>
            None recorded this month.
          </Text>
        ) : (
          <Table size="small" aria-labelledby="summary-people">
            <TableHeader>
              <TableRow>
                <TableHeaderCell>Partner agency</TableHeaderCell>
                {PEOPLE_GROUPS.map((group) => (
                  <TableHeaderCell
                    key={group}
                    className={styles.numeric}
                    button={{ className: styles.numericHead }}
                  >
                    {PEOPLE_GROUP_LABELS[group]}
                  </TableHeaderCell>
                ))}
              </TableRow>
            </TableHeader>
            <TableBody>
              {agenciesServed.map((agencyId) => (
                <TableRow key={agencyId}>
                  <TableCell>{agencyName(agencyId)}</TableCell>
                  {PEOPLE_GROUPS.map((group) => (
                    <TableCell key={group} className={styles.numeric}>
                      {formatCount(served(agencyId, group))}
                    </TableCell>
                  ))}
                </TableRow>
              ))}
            </TableBody>
          </Table>
        )}
      </section>

      <section className={styles.section} aria-labelledby="summary-more">
        <SectionHeading id="summary-more">Hours, yarn and notes</SectionHeading>
        <FactList
          rows={[
            [
              'Volunteer hours',
              <span className={styles.numeric}>{hours.format(values.volunteerHours)}</span>,
            ],
            [
              'Yarn donated',
              values.yarnDonated
                ? (yarnConversion(String(values.yarnDonated.value), values.yarnDonated.unit) ??
                  `${values.yarnDonated.value} ${values.yarnDonated.unit}`)
                : 'None',
            ],
            ['Notes', <span className={styles.notes}>{values.notes ?? '—'}</span>],
          ]}
        />
      </section>
    </div>
  );
}
