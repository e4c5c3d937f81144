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
import { formatCount, formatFigure } from '@/lib/format';
import { isBabySize, SAFE_SLEEP_CAUTION } from './safe-sleep';
import { yarnInWords } from './yarn';

type Row = [string, ReactNode];

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
    alignItems: 'start',
  },
  // Labels take what they need and wrap when the column is narrow; the figures keep at least
  // 8 characters, so a count never breaks digit by digit. Kept narrow, so that a right-aligned
  // figure stays near its label.
  facts: {
    gridTemplateColumns: 'minmax(min-content, max-content) minmax(8ch, 1fr)',
    maxWidth: '30rem',
  },
  figure: {
    display: 'block',
    textAlign: 'end',
    whiteSpace: 'nowrap',
    fontVariantNumeric: 'tabular-nums',
  },
  // A lone figure among text (hours beside notes) stays where its label ends.
  inlineFigure: { whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' },
  numeric: { textAlign: 'end', whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' },
  // A header cell lays its text out in an inner box: push that to the right as well.
  numericHead: { justifyContent: 'flex-end' },
  none: { margin: 0, color: tokens.colorNeutralForeground2 },
  text: { whiteSpace: 'pre-wrap' },
});

export interface TallySummaryProps {
  values: TallyValues;
  /** Where the size and agency names come from. */
  detail: Pick<TallyDetail, 'checkContext' | 'agencies'>;
  /** Prefix of the section headings' ids, for a page that shows two summaries. */
  idPrefix?: string;
}

/**
 * Every figure of a tally, read-only, to read, review and print: the tally page, the review
 * page and the printed form show the same thing. Figures are right-aligned on one line.
 */
export function TallySummary({ values, detail, idPrefix = 'summary' }: TallySummaryProps) {
  const styles = useStyles();
  const id = (section: string) => `${idPrefix}-${section}`;
  const sizeName = (sizeId: number) =>
    detail.checkContext.blanketSizes.find((size) => size.id === sizeId)?.name ?? `Size ${sizeId}`;
  const agencyName = (agencyId: number) =>
    detail.agencies.find((agency) => agency.id === agencyId)?.name ?? `Agency ${agencyId}`;
  const figure = (value: number) => <span className={styles.figure}>{formatFigure(value)}</span>;
  const agenciesServed = [...new Set(values.peopleServed.map((line) => line.partnerAgencyId))];
  const served = (agencyId: number, group: (typeof PEOPLE_GROUPS)[number]) =>
    values.peopleServed
      .filter((line) => line.partnerAgencyId === agencyId && line.group === group)
      .reduce((sum, line) => sum + line.count, 0);
  const babyGiven = values.blankets.given.some((line) => isBabySize(sizeName(line.blanketSizeId)));

  return (
    <div className={styles.root}>
      <div className={styles.columns}>
        <section className={styles.section} aria-labelledby={id('panels')}>
          <SectionHeading id={id('panels')}>Panels</SectionHeading>
          <FactList
            className={styles.facts}
            rows={[
              ['Opening stock', figure(values.panels.opening)],
              ['Accepted', figure(values.panels.accepted)],
              ['Used in assembly', figure(values.panels.usedInAssembly)],
              ['Closing stock', figure(values.panels.closing)],
              ...SET_ASIDE_REASONS.map(
                (reason) =>
                  [
                    `Set aside: ${SET_ASIDE_LABELS[reason]}`,
                    figure(values.panels.setAside[reason]),
                  ] as Row,
              ),
              ...(values.receiptsDifferenceReason
                ? [
                    [
                      'Why accepted differs from receipts',
                      <span className={styles.text}>{values.receiptsDifferenceReason}</span>,
                    ] as Row,
                  ]
                : []),
            ]}
          />
        </section>
        <section className={styles.section} aria-labelledby={id('blankets')}>
          <SectionHeading id={id('blankets')}>Blankets</SectionHeading>
          <FactList
            className={styles.facts}
            rows={[
              ['Opening stock', figure(values.blankets.opening)],
              ...values.blankets.assembled.map(
                (line) => [`Assembled: ${sizeName(line.blanketSizeId)}`, figure(line.count)] as Row,
              ),
              ['Finished blankets received', figure(values.blankets.received)],
              [
                'Given out',
                figure(values.blankets.given.reduce((sum, line) => sum + line.count, 0)),
              ],
              ['Closing stock', figure(values.blankets.closing)],
            ]}
          />
        </section>
      </div>

      <section className={styles.section} aria-labelledby={id('given')}>
        <SectionHeading id={id('given')}>Blankets given out</SectionHeading>
        {values.blankets.given.length === 0 ? (
          <Text as="p" className={styles.none}>
            None this month.
          </Text>
        ) : (
          <Table size="small" aria-labelledby={id('given')}>
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

      <section className={styles.section} aria-labelledby={id('people')}>
        <SectionHeading id={id('people')}>People served</SectionHeading>
        {agenciesServed.length === 0 ? (
          <Text as="p" className={styles.none}>
            None recorded this month.
          </Text>
        ) : (
          <Table size="small" aria-labelledby={id('people')}>
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

      <section className={styles.section} aria-labelledby={id('more')}>
        <SectionHeading id={id('more')}>Hours, yarn and notes</SectionHeading>
        <FactList
          rows={[
            [
              'Volunteer hours',
              <span className={styles.inlineFigure}>{formatFigure(values.volunteerHours)}</span>,
            ],
            [
              'Yarn donated',
              values.yarnDonated
                ? yarnInWords(values.yarnDonated.value, values.yarnDonated.unit)
                : 'None',
            ],
            ['Notes', <span className={styles.text}>{values.notes ?? 'None'}</span>],
          ]}
        />
      </section>
    </div>
  );
}
