/** A path id as the API takes it: a positive whole number, or null for anything else ("abc", "0", "1.5"). */
export function routeId(raw: string | undefined): number | null {
  if (raw === undefined || !/^\d{1,10}$/.test(raw)) return null;
  const id = Number(raw);
  return id > 0 && id <= 2 ** 31 ? id : null;
}
