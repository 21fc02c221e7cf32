/**
 * A moment as ISO 8601 in UTC to the second, e.g. 2026-12-03T08:33:00Z (the
 * audit log and its CSV export). Unreadable input gives "–".
 */
export function isoDateTime(moment: string | Date | null | undefined): string {
  if (moment === null || moment === undefined || moment === '') return '–';
  const date = moment instanceof Date ? moment : new Date(moment);
  if (Number.isNaN(date.getTime())) return '–';
  return date.toISOString().replace(/\.\d{3}Z$/, 'Z');
}
