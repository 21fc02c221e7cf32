/**
 * A file size as people read it: binary multiples (KiB, MiB), as the API's
 * upload limit is stated (20 MiB).
 */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return '–';
  if (bytes < 1024) return `${bytes} B`;
  const units = ['KiB', 'MiB', 'GiB'];
  let value = bytes / 1024;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit += 1;
  }
  return `${value >= 100 ? value.toFixed(0) : value.toFixed(1)} ${units[unit]}`;
}

/** A hash shortened for a table: its first 12 hex digits, grouped like a verify code. */
export function shortHash(hex: string): string {
  return (
    hex
      .slice(0, 12)
      .match(/.{1,4}/g)
      ?.join(' ') ?? hex
  );
}

/** The file kinds the API accepts, for the file picker's hint (the server decides by content). */
export const ACCEPTED_FILES = '.pdf,.png,.jpg,.jpeg,.dxf,application/pdf,image/png,image/jpeg';
