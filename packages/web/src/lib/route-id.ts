/** An id from the URL (`/dashboard/regions/:id`); undefined for anything but a positive whole number. */
export function parseRouteId(value: string | undefined): number | undefined {
  if (!value || !/^\d+$/.test(value)) return undefined;
  const id = Number(value);
  return id > 0 && Number.isSafeInteger(id) ? id : undefined;
}
