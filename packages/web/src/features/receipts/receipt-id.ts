/** A parcel's id from the URL (`/receipts/:id`); undefined for anything but a positive whole number. */
export function parseReceiptId(value: string | undefined): number | undefined {
  if (!value || !/^\d+$/.test(value)) return undefined;
  const id = Number(value);
  return id > 0 && Number.isSafeInteger(id) ? id : undefined;
}
