import {
  SET_ASIDE_REASONS,
  type BlanketSizeView,
  type ParcelReceiptDetail,
  type ParcelReceiptInput,
  type SetAsideReason,
} from '@tallyloom/core';

/** A parcel as the form holds it: text as typed, so a half-typed number is never lost. */
export interface ReceiptDraft {
  chapterId: number | null;
  receivedOn: string;
  senderName: string;
  senderEmail: string;
  senderAddress: string;
  campaignCode: string;
  panelsAccepted: string;
  setAside: Record<SetAsideReason, string>;
  setAsideOtherNote: string;
  /** Finished blankets by blanket size id. */
  finished: Record<number, string>;
  otherItems: string;
  notes: string;
  sampleWidth: string;
  sampleHeight: string;
  sampleUnit: 'in' | 'cm';
}

/** A size the form asks about: the catalogue's sizes in use, and any already on the parcel. */
export interface FormBlanketSize {
  id: number;
  name: string;
}

/**
 * The form's fields, named as the server names them in a 400's `fields`, so each message lands
 * beside its field. Finished blankets are `finished.<sizeId>`; see `serverAliases`.
 */
export type ReceiptField = string;

export type ReceiptProblems = Partial<Record<ReceiptField, string>>;

const emptySetAside: Record<SetAsideReason, string> = {
  offSize: '0',
  hardCareYarn: '0',
  soiledOrDamaged: '0',
  other: '0',
};

export function emptyDraft(chapterId: number | null, receivedOn: string): ReceiptDraft {
  return {
    chapterId,
    receivedOn,
    senderName: '',
    senderEmail: '',
    senderAddress: '',
    campaignCode: '',
    panelsAccepted: '',
    setAside: { ...emptySetAside },
    setAsideOtherNote: '',
    finished: {},
    otherItems: '0',
    notes: '',
    sampleWidth: '',
    sampleHeight: '',
    sampleUnit: 'in',
  };
}

export function draftOf(receipt: ParcelReceiptDetail): ReceiptDraft {
  return {
    chapterId: receipt.chapterId,
    receivedOn: receipt.receivedOn,
    senderName: receipt.sender?.name ?? '',
    senderEmail: receipt.sender?.email ?? '',
    senderAddress: receipt.sender?.address ?? '',
    campaignCode: receipt.campaignCode ?? '',
    panelsAccepted: String(receipt.panelsAccepted),
    setAside: {
      offSize: String(receipt.setAside.offSize),
      hardCareYarn: String(receipt.setAside.hardCareYarn),
      soiledOrDamaged: String(receipt.setAside.soiledOrDamaged),
      other: String(receipt.setAside.other),
    },
    setAsideOtherNote: receipt.setAsideOtherNote ?? '',
    finished: Object.fromEntries(
      receipt.finishedBlankets.map((row) => [row.blanketSizeId, String(row.count)]),
    ),
    otherItems: String(receipt.otherItems),
    notes: receipt.notes ?? '',
    sampleWidth: receipt.samplePanel ? String(receipt.samplePanel.width) : '',
    sampleHeight: receipt.samplePanel ? String(receipt.samplePanel.height) : '',
    sampleUnit: receipt.samplePanel?.unit ?? 'in',
  };
}

/** The sizes in use, then any retired size the parcel already counts, so nothing is dropped. */
export function formBlanketSizes(
  catalogue: BlanketSizeView[],
  receipt?: ParcelReceiptDetail,
): FormBlanketSize[] {
  const sizes: FormBlanketSize[] = catalogue
    .filter((size) => size.active)
    .map(({ id, name }) => ({ id, name }));
  for (const row of receipt?.finishedBlankets ?? []) {
    if (!sizes.some((size) => size.id === row.blanketSizeId)) {
      sizes.push({ id: row.blanketSizeId, name: row.name });
    }
  }
  return sizes;
}

/** Safe-sleep guidance applies to the sizes made for infants (BRIEF §8). */
export function isBabySize(size: FormBlanketSize): boolean {
  return /\bbaby\b|\binfant\b/i.test(size.name);
}

const wholeNumber = /^\d+$/;

function count(value: string): number {
  return wholeNumber.test(value.trim()) ? Number(value.trim()) : 0;
}

function countProblem(value: string, what: string): string | undefined {
  const text = value.trim();
  if (text === '') return `Enter the number of ${what} (0 if none).`;
  if (!wholeNumber.test(text)) return 'Enter a whole number, 0 or more.';
  return undefined;
}

/** A positive measurement, e.g. "7.25"; undefined when not one. */
export function measurement(value: string): number | undefined {
  const text = value.trim().replace(',', '.');
  if (!/^\d+(\.\d+)?$/.test(text)) return undefined;
  const number = Number(text);
  return number > 0 ? number : undefined;
}

/** What the browser can tell before sending; the server checks the rest (dates, ceilings). */
export function draftProblems(
  draft: ReceiptDraft,
  sizes: FormBlanketSize[],
  today: string,
): ReceiptProblems {
  const problems: ReceiptProblems = {};
  if (draft.chapterId === null) problems.chapterId = 'Choose the chapter that received it.';
  if (!/^\d{4}-\d{2}-\d{2}$/.test(draft.receivedOn)) {
    problems.receivedOn = 'Enter the day the parcel arrived.';
  } else if (draft.receivedOn > today) {
    problems.receivedOn = 'The day cannot be in the future.';
  }
  if (draft.senderEmail.trim() && !/^[^\s@]+@[^\s@]+$/.test(draft.senderEmail.trim())) {
    problems['sender.email'] = 'Enter an address like name@example.org, or leave it empty.';
  }
  problems.panelsAccepted = countProblem(draft.panelsAccepted, 'panels accepted');
  for (const reason of SET_ASIDE_REASONS) {
    problems[`setAside.${reason}`] = countProblem(draft.setAside[reason], 'panels');
  }
  if (count(draft.setAside.other) > 0 && !draft.setAsideOtherNote.trim()) {
    problems.setAsideOtherNote = 'Say why these panels were set aside.';
  }
  for (const size of sizes) {
    problems[`finished.${size.id}`] = countProblem(draft.finished[size.id] ?? '0', 'blankets');
  }
  problems.otherItems = countProblem(draft.otherItems, 'other items');
  const width = draft.sampleWidth.trim();
  const height = draft.sampleHeight.trim();
  if (width || height) {
    if (measurement(width) === undefined) {
      problems['samplePanel.width'] = 'Enter the width as a number above 0, or clear both sides.';
    }
    if (measurement(height) === undefined) {
      problems['samplePanel.height'] = 'Enter the height as a number above 0, or clear both sides.';
    }
  }
  return Object.fromEntries(
    Object.entries(problems).filter((entry): entry is [string, string] => !!entry[1]),
  );
}

function textOrNull(value: string): string | null {
  const text = value.trim();
  return text === '' ? null : text;
}

/**
 * The draft as the API takes it. Every size the form shows is sent, zeros included (the server
 * keeps only counts above 0), in the form's order, so `finishedBlankets.<i>` names a field here.
 * `senderErased`: the sender was erased for good, so no sender is sent at all.
 */
export function inputOf(
  draft: ReceiptDraft,
  sizes: FormBlanketSize[],
  options: { senderErased?: boolean } = {},
): ParcelReceiptInput {
  const sender = {
    name: textOrNull(draft.senderName),
    email: textOrNull(draft.senderEmail),
    address: textOrNull(draft.senderAddress),
  };
  const hasSender = !!(sender.name || sender.email || sender.address);
  const width = measurement(draft.sampleWidth);
  const height = measurement(draft.sampleHeight);
  const setAsideOther = count(draft.setAside.other);
  return {
    chapterId: draft.chapterId ?? 0,
    receivedOn: draft.receivedOn,
    ...(options.senderErased ? {} : { sender: hasSender ? sender : null }),
    campaignCode: textOrNull(draft.campaignCode),
    panelsAccepted: count(draft.panelsAccepted),
    setAside: {
      offSize: count(draft.setAside.offSize),
      hardCareYarn: count(draft.setAside.hardCareYarn),
      soiledOrDamaged: count(draft.setAside.soiledOrDamaged),
      other: setAsideOther,
    },
    setAsideOtherNote: setAsideOther > 0 ? textOrNull(draft.setAsideOtherNote) : null,
    finishedBlankets: sizes.map((size) => ({
      blanketSizeId: size.id,
      count: count(draft.finished[size.id] ?? '0'),
    })),
    otherItems: count(draft.otherItems),
    notes: textOrNull(draft.notes),
    samplePanel:
      width !== undefined && height !== undefined
        ? { width, height, unit: draft.sampleUnit }
        : null,
  };
}

/** The fields the form shows, for sorting the server's messages onto them. */
export function formFields(sizes: FormBlanketSize[]): ReceiptField[] {
  return [
    'chapterId',
    'receivedOn',
    'sender',
    'sender.name',
    'sender.email',
    'sender.address',
    'campaignCode',
    'panelsAccepted',
    ...SET_ASIDE_REASONS.map((reason) => `setAside.${reason}`),
    'setAsideOtherNote',
    ...sizes.map((size) => `finished.${size.id}`),
    'otherItems',
    'notes',
    'samplePanel',
    'samplePanel.width',
    'samplePanel.height',
    'samplePanel.unit',
  ];
}

/** The server names a finished-blanket row by its place in the list the form sent. */
export function serverAliases(sizes: FormBlanketSize[]): Record<string, ReceiptField> {
  return Object.fromEntries(
    sizes.flatMap((size, index) => [
      [`finishedBlankets.${index}.count`, `finished.${size.id}`],
      [`finishedBlankets.${index}.blanketSizeId`, `finished.${size.id}`],
    ]),
  );
}
