/** Times are shown in the reader's zone, to the minute; the API sends UTC ISO strings. */
export function formatDateTime(iso: string | null | undefined): string {
  if (!iso) return '–';
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '–';
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())} ${pad(date.getHours())}:${pad(date.getMinutes())}`;
}

export function formatDate(iso: string | null | undefined): string {
  return formatDateTime(iso).slice(0, 10);
}

/** The verify code of a content hash: its first 12 hex digits as xxxx-xxxx-xxxx (API.md). */
export function verifyCodeOf(contentHash: string): string {
  const head = contentHash.slice(0, 12);
  return head.match(/.{1,4}/g)?.join('-') ?? head;
}
