import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  Field,
  Input,
  makeStyles,
  Select,
  Text,
  Textarea,
  tokens,
} from '@fluentui/react-components';
import { Info16Regular } from '@fluentui/react-icons';
import {
  SET_ASIDE_LABELS,
  SET_ASIDE_REASONS,
  type ChapterView,
  type ParcelReceiptInput,
} from '@tallyloom/core';
import { useEffect, useId, useState, type FormEvent, type ReactNode } from 'react';
import { useBlocker } from 'react-router-dom';
import { FormAlert } from '@/components/ui/form-alert';
import { LinkButton } from '@/components/ui/link-button';
import { SectionHeading } from '@/components/ui/section-heading';
import { formProblems, shownProblems } from '@/lib/form-errors';
import { formatDate, todayIsoDate } from '@/lib/format';
import { useCampaigns } from '../api/get-campaigns';
import {
  draftProblems,
  formFields,
  inputOf,
  isBabySize,
  serverAliases,
  type FormBlanketSize,
  type ReceiptDraft,
  type ReceiptField,
} from './receipt-draft';
import { SAFE_SLEEP_CAUTION } from './labels';
import { SamplePanelCheck } from './sample-panel-check';

const useStyles = makeStyles({
  form: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalL,
    maxWidth: '960px',
  },
  section: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    paddingBottom: tokens.spacingVerticalM,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
  },
  row: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-start',
    gap: tokens.spacingHorizontalL,
  },
  narrow: { width: '160px' },
  medium: { width: '240px' },
  wide: { flexGrow: 1, minWidth: '280px' },
  note: { margin: 0, color: tokens.colorNeutralForeground2, maxWidth: '72ch' },
  caution: {
    display: 'flex',
    gap: tokens.spacingHorizontalXS,
    alignItems: 'flex-start',
    color: tokens.colorNeutralForeground1,
  },
  babyField: { width: '360px' },
  actions: { display: 'flex', gap: tokens.spacingHorizontalS },
});

export interface ReceiptFormProps {
  initial: ReceiptDraft;
  /** The chapters the person may log for; a chapter lead has only theirs. */
  chapters: ChapterView[];
  sizes: FormBlanketSize[];
  toleranceIn: number | undefined;
  /** The sender was erased for good: the fields are not offered again. */
  senderErased?: boolean;
  /** The last failed save, whose field messages go beside the fields. */
  error: unknown;
  pending: boolean;
  submitLabel: string;
  pendingLabel: string;
  cancelTo: string;
  /** Above the form: e.g. a conflict with someone else's change. */
  banner?: ReactNode;
  onSubmit: (input: ParcelReceiptInput) => void;
}

/** Navigations after a successful save carry this state, so the "unsaved changes" guard lets them by. */
export const savedNavigationState = { receiptSaved: true } as const;

function isSavedNavigation(state: unknown): boolean {
  return typeof state === 'object' && state !== null && 'receiptSaved' in state;
}

/** The parcel form: one local draft, checked as typed, with the server's word beside each field. */
export function ReceiptForm({
  initial,
  chapters,
  sizes,
  toleranceIn,
  senderErased = false,
  error,
  pending,
  submitLabel,
  pendingLabel,
  cancelTo,
  banner,
  onSubmit,
}: ReceiptFormProps) {
  const styles = useStyles();
  const [draft, setDraft] = useState<ReceiptDraft>(initial);
  const [submitted, setSubmitted] = useState(false);
  const today = todayIsoDate();
  const campaignListId = useId();

  const validDate = /^\d{4}-\d{2}-\d{2}$/.test(draft.receivedOn);
  const campaigns = useCampaigns({ activeOn: draft.receivedOn }, { enabled: validDate });

  const fields = formFields(sizes);
  const local = draftProblems(draft, sizes, today);
  const server = error
    ? formProblems<ReceiptField>(error, fields, serverAliases(sizes))
    : { fields: {}, general: [] };
  const shown = shownProblems<ReceiptField>(local, server.fields, submitted);

  const dirty = JSON.stringify(draft) !== JSON.stringify(initial);
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      dirty &&
      !isSavedNavigation(nextLocation.state) &&
      currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (!dirty) return undefined;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const set = <K extends keyof ReceiptDraft>(key: K, value: ReceiptDraft[K]) =>
    setDraft((current) => ({ ...current, [key]: value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setSubmitted(true);
    if (Object.keys(local).length > 0) return;
    onSubmit(inputOf(draft, sizes, { senderErased }));
  };

  const chapterName = (chapter: ChapterView) =>
    chapter.activeTo ? `${chapter.name} (closed ${formatDate(chapter.activeTo)})` : chapter.name;

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label="Parcel">
      {banner}
      <FormAlert messages={server.general} />

      <section className={styles.section} aria-labelledby="receipt-when-where">
        <SectionHeading id="receipt-when-where">When and where</SectionHeading>
        <div className={styles.row}>
          <Field
            label="Chapter"
            required
            validationMessage={shown.chapterId}
            className={styles.medium}
          >
            <Select
              value={draft.chapterId === null ? '' : String(draft.chapterId)}
              disabled={chapters.length === 0}
              onChange={(_event, data) => set('chapterId', data.value ? Number(data.value) : null)}
            >
              {chapters.length === 0 ? <option value="">Loading chapters…</option> : null}
              {chapters.length > 1 ? <option value="">Choose a chapter</option> : null}
              {chapters.map((chapter) => (
                <option key={chapter.id} value={chapter.id}>
                  {chapterName(chapter)}
                </option>
              ))}
            </Select>
          </Field>
          <Field
            label="Received on"
            required
            validationMessage={shown.receivedOn}
            className={styles.narrow}
          >
            <Input
              type="date"
              max={today}
              value={draft.receivedOn}
              onChange={(_event, data) => set('receivedOn', data.value)}
            />
          </Field>
        </div>
      </section>

      <section className={styles.section} aria-labelledby="receipt-sender">
        <SectionHeading id="receipt-sender">Sender (optional)</SectionHeading>
        <Text as="p" className={styles.note}>
          A sender&apos;s name, e-mail and address are personal data: they are shown only to the
          receiving chapter, national staff, network admins and auditors, and never leave Tallyloom
          in figures for funders. Leave them empty when they are not needed.
        </Text>
        {senderErased ? (
          <Text as="p" className={styles.note}>
            A network admin erased this sender&apos;s details; they cannot be entered again.
          </Text>
        ) : (
          <>
            <FormAlert messages={shown.sender ? [shown.sender] : []} />
            <div className={styles.row}>
              <Field
                label="Name"
                validationMessage={shown['sender.name']}
                className={styles.medium}
              >
                <Input
                  autoComplete="off"
                  value={draft.senderName}
                  onChange={(_event, data) => set('senderName', data.value)}
                />
              </Field>
              <Field
                label="E-mail"
                validationMessage={shown['sender.email']}
                className={styles.medium}
              >
                <Input
                  type="email"
                  autoComplete="off"
                  value={draft.senderEmail}
                  onChange={(_event, data) => set('senderEmail', data.value)}
                />
              </Field>
            </div>
            <Field label="Postal address" validationMessage={shown['sender.address']}>
              <Textarea
                rows={2}
                resize="vertical"
                value={draft.senderAddress}
                onChange={(_event, data) => set('senderAddress', data.value)}
              />
            </Field>
          </>
        )}
      </section>

      <section className={styles.section} aria-labelledby="receipt-counts">
        <SectionHeading id="receipt-counts">Campaign and panels</SectionHeading>
        <div className={styles.row}>
          <Field
            label="Campaign code"
            validationMessage={shown.campaignCode}
            hint="As written on the label. A code that matches no campaign running on that day is kept, uncredited."
            className={styles.wide}
          >
            <Input
              value={draft.campaignCode}
              list={campaignListId}
              onChange={(_event, data) => set('campaignCode', data.value.toUpperCase())}
            />
          </Field>
          <datalist id={campaignListId}>
            {(campaigns.data ?? []).map((campaign) => (
              <option key={campaign.id} value={campaign.code}>
                {campaign.name}
              </option>
            ))}
          </datalist>
          <Field
            label="Panels accepted"
            required
            validationMessage={shown.panelsAccepted}
            className={styles.narrow}
          >
            <Input
              type="number"
              min={0}
              step={1}
              inputMode="numeric"
              value={draft.panelsAccepted}
              onChange={(_event, data) => set('panelsAccepted', data.value)}
            />
          </Field>
        </div>
        <Text as="h3" weight="semibold">
          Panels set aside, by reason
        </Text>
        <div className={styles.row}>
          {SET_ASIDE_REASONS.map((reason) => (
            <Field
              key={reason}
              label={SET_ASIDE_LABELS[reason]}
              validationMessage={shown[`setAside.${reason}`]}
              className={styles.narrow}
            >
              <Input
                type="number"
                min={0}
                step={1}
                inputMode="numeric"
                value={draft.setAside[reason]}
                onChange={(_event, data) =>
                  set('setAside', { ...draft.setAside, [reason]: data.value })
                }
              />
            </Field>
          ))}
        </div>
        {Number(draft.setAside.other) > 0 || shown.setAsideOtherNote ? (
          <Field
            label="Why the “Other” panels were set aside"
            required
            validationMessage={shown.setAsideOtherNote}
          >
            <Input
              value={draft.setAsideOtherNote}
              onChange={(_event, data) => set('setAsideOtherNote', data.value)}
            />
          </Field>
        ) : null}
      </section>

      <section className={styles.section} aria-labelledby="receipt-finished">
        <SectionHeading id="receipt-finished">Finished items received</SectionHeading>
        <div className={styles.row}>
          {sizes.map((size) => {
            const baby = isBabySize(size);
            return (
              <Field
                key={size.id}
                label={`${size.name} blankets`}
                validationMessage={shown[`finished.${size.id}`]}
                className={baby ? styles.babyField : styles.narrow}
                hint={
                  baby ? (
                    <span className={styles.caution}>
                      <Info16Regular aria-hidden="true" />
                      {SAFE_SLEEP_CAUTION}
                    </span>
                  ) : undefined
                }
              >
                <Input
                  type="number"
                  min={0}
                  step={1}
                  inputMode="numeric"
                  value={draft.finished[size.id] ?? '0'}
                  onChange={(_event, data) =>
                    set('finished', { ...draft.finished, [size.id]: data.value })
                  }
                />
              </Field>
            );
          })}
          <Field
            label="Other items"
            hint="Hats, scarves and anything else that is not a blanket."
            validationMessage={shown.otherItems}
            className={styles.medium}
          >
            <Input
              type="number"
              min={0}
              step={1}
              inputMode="numeric"
              value={draft.otherItems}
              onChange={(_event, data) => set('otherItems', data.value)}
            />
          </Field>
        </div>
        <Field label="Notes" validationMessage={shown.notes}>
          <Textarea
            rows={3}
            resize="vertical"
            value={draft.notes}
            onChange={(_event, data) => set('notes', data.value)}
          />
        </Field>
      </section>

      <section className={styles.section} aria-labelledby="receipt-sample">
        <SectionHeading id="receipt-sample">Sample panel (optional)</SectionHeading>
        <Text as="p" className={styles.note}>
          Measure one panel from the parcel to check it against the 7 × 9 in standard.
        </Text>
        <div className={styles.row}>
          <Field
            label="Width"
            validationMessage={shown['samplePanel.width']}
            className={styles.narrow}
          >
            <Input
              inputMode="decimal"
              value={draft.sampleWidth}
              onChange={(_event, data) => set('sampleWidth', data.value)}
            />
          </Field>
          <Field
            label="Height"
            validationMessage={shown['samplePanel.height']}
            className={styles.narrow}
          >
            <Input
              inputMode="decimal"
              value={draft.sampleHeight}
              onChange={(_event, data) => set('sampleHeight', data.value)}
            />
          </Field>
          <Field
            label="Unit"
            validationMessage={shown['samplePanel.unit']}
            className={styles.narrow}
          >
            <Select
              value={draft.sampleUnit}
              onChange={(_event, data) => set('sampleUnit', data.value === 'cm' ? 'cm' : 'in')}
            >
              <option value="in">inches (in)</option>
              <option value="cm">centimetres (cm)</option>
            </Select>
          </Field>
        </div>
        <SamplePanelCheck
          width={draft.sampleWidth}
          height={draft.sampleHeight}
          unit={draft.sampleUnit}
          toleranceIn={toleranceIn}
        />
      </section>

      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabledFocusable={pending}>
          {pending ? pendingLabel : submitLabel}
        </Button>
        <LinkButton to={cancelTo}>Cancel</LinkButton>
      </div>

      <Dialog
        modalType="alert"
        open={blocker.state === 'blocked'}
        onOpenChange={(_event, data) => {
          if (!data.open && blocker.state === 'blocked') blocker.reset();
        }}
      >
        <DialogSurface>
          <DialogBody>
            <DialogTitle>Leave without saving?</DialogTitle>
            <DialogContent>
              The changes on this form have not been saved. If you leave now, they are lost.
            </DialogContent>
            <DialogActions>
              <Button appearance="primary" onClick={() => blocker.reset?.()}>
                Stay on the form
              </Button>
              <Button onClick={() => blocker.proceed?.()}>Leave without saving</Button>
            </DialogActions>
          </DialogBody>
        </DialogSurface>
      </Dialog>
    </form>
  );
}
