/** A tally's id from the URL (`/review/:id`); undefined for anything but a positive whole number. */
export function parseTallyId(value: string | undefined): number | undefined {
  if (!value || !/^\d+$/.test(value)) return undefined;
  const id = Number(value);
  return id > 0 && Number.isSafeInteger(id) ? id : undefined;
}
