import type { FieldProblem, ParcelReceiptInput } from '@tallyloom/core';
import type { ParcelReceipt } from './models/parcel-receipt.model';

/**
 * The rules of a parcel receipt that need the network's data (the chapter's dates, the count
 * ceiling setting, the blanket size catalogue), after its shape passed ReceiptInputDto. One
 * function for the form and the bulk import, so a row is judged exactly as the form would judge it.
 */
export interface ReceiptRuleContext {
  chapter: { name: string; activeFrom: string; activeTo: string | null };
  /** The most of any one count a parcel may hold (a setting). */
  ceiling: number;
  /** The blanket sizes the input names, by id. */
  sizes: Map<number, { name: string; active: boolean }>;
  /** The receipt being corrected had its sender erased. */
  senderErased: boolean;
  /** Today where it is already latest; see latestToday(). */
  today: string;
}

/**
 * Today's date where it is already latest (UTC+14), so a parcel logged in the evening anywhere on
 * Earth is never "in the future"; a date beyond that is.
 */
export function latestToday(now = new Date()): string {
  return new Date(now.getTime() + 14 * 3600_000).toISOString().slice(0, 10);
}

export function receiptProblems(
  body: ParcelReceiptInput,
  context: ReceiptRuleContext,
): FieldProblem[] {
  const found: FieldProblem[] = [];
  const problem = (field: string, message: string) => found.push({ field, messages: [message] });
  const { chapter } = context;

  if (body.receivedOn > context.today)
    problem('receivedOn', 'receivedOn must not be in the future.');
  else if (body.receivedOn < chapter.activeFrom)
    problem(
      'receivedOn',
      `receivedOn ${body.receivedOn} is before ${chapter.name} started on ${chapter.activeFrom}.`,
    );
  else if (chapter.activeTo && body.receivedOn > chapter.activeTo)
    problem(
      'receivedOn',
      `receivedOn ${body.receivedOn} is after ${chapter.name} closed on ${chapter.activeTo}.`,
    );

  const ceiling = context.ceiling;
  const counts: Array<[string, number]> = [
    ['panelsAccepted', body.panelsAccepted],
    ['setAside.offSize', body.setAside.offSize],
    ['setAside.hardCareYarn', body.setAside.hardCareYarn],
    ['setAside.soiledOrDamaged', body.setAside.soiledOrDamaged],
    ['setAside.other', body.setAside.other],
    ['otherItems', body.otherItems],
    ...body.finishedBlankets.map((row, index): [string, number] => [
      `finishedBlankets.${index}.count`,
      row.count,
    ]),
  ];
  for (const [field, value] of counts) {
    if (value > ceiling)
      problem(
        field,
        `${field} ${value} is implausibly large: one parcel holds at most ${ceiling} (a setting); check the figure.`,
      );
  }

  const seen = new Set<number>();
  body.finishedBlankets.forEach((row, index) => {
    const field = `finishedBlankets.${index}.blanketSizeId`;
    const size = context.sizes.get(row.blanketSizeId);
    if (seen.has(row.blanketSizeId)) problem(field, 'This blanket size is listed twice.');
    else if (!size) problem(field, 'No such blanket size.');
    else if (!size.active) problem(field, `The blanket size ${size.name} is no longer in use.`);
    seen.add(row.blanketSizeId);
  });

  const sender = body.sender;
  const senderGiven = sender && (sender.name || sender.email || sender.address);
  if (context.senderErased && senderGiven)
    problem('sender', "This receipt's sender details were erased; they cannot be entered again.");

  return found;
}

/** The columns a receipt's input fills (everything but identity, sender erasure and version). */
export type ReceiptValues = Pick<
  ParcelReceipt,
  | 'chapterId'
  | 'receivedOn'
  | 'campaignId'
  | 'campaignCodeEntered'
  | 'panelsAccepted'
  | 'setAsideOffSize'
  | 'setAsideHardCareYarn'
  | 'setAsideSoiledOrDamaged'
  | 'setAsideOther'
  | 'setAsideOtherNote'
  | 'otherItems'
  | 'notes'
  | 'sampleWidth'
  | 'sampleHeight'
  | 'sampleUnit'
> &
  Partial<Pick<ParcelReceipt, 'senderName' | 'senderEmail' | 'senderAddress'>>;

export interface ResolvedInput {
  values: ReceiptValues;
  finishedBlankets: Array<{ blanketSizeId: number; count: number }>;
}

/**
 * The stored columns of an input that passed the rules. `campaignId` is the campaign the code
 * credits (or null); `keepStoredSender` leaves the sender columns out, as a correction without
 * `sender` does.
 */
export function receiptValues(
  body: ParcelReceiptInput,
  chapterId: number,
  campaignId: number | null,
  options: { keepStoredSender?: boolean } = {},
): ResolvedInput {
  const sender = body.sender;
  const sample = body.samplePanel ?? null;
  return {
    values: {
      chapterId,
      receivedOn: body.receivedOn,
      ...(options.keepStoredSender
        ? {}
        : {
            senderName: sender?.name ?? null,
            senderEmail: sender?.email ?? null,
            senderAddress: sender?.address ?? null,
          }),
      campaignId,
      campaignCodeEntered: body.campaignCode ?? null,
      panelsAccepted: body.panelsAccepted,
      setAsideOffSize: body.setAside.offSize,
      setAsideHardCareYarn: body.setAside.hardCareYarn,
      setAsideSoiledOrDamaged: body.setAside.soiledOrDamaged,
      setAsideOther: body.setAside.other,
      setAsideOtherNote: body.setAsideOtherNote ?? null,
      otherItems: body.otherItems,
      notes: body.notes ?? null,
      sampleWidth: sample?.width ?? null,
      sampleHeight: sample?.height ?? null,
      sampleUnit: sample?.unit ?? null,
    },
    // A size listed with 0 blankets says nothing; it is not stored.
    finishedBlankets: body.finishedBlankets
      .filter((row) => row.count > 0)
      .map(({ blanketSizeId, count }) => ({ blanketSizeId, count })),
  };
}
