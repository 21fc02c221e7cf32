/**
 * A verify code, a content hash or a package code as someone types it:
 * dashes, spaces and case do not matter (the server's rule, API.md
 * `/verify/:code` and `/verify/packages/:code`). Returns the form for the
 * address bar (xxxx-xxxx-xxxx for a sheet's code, 64 hex for a hash,
 * PKG-xxxx-xxxx-xxxx for a package), or the reason it cannot be one.
 */
export function readVerifyCode(
  typed: string,
): { readonly ok: true; readonly code: string } | { readonly ok: false; readonly reason: string } {
  const hex = typed.replace(/[\s-]/g, '').toLowerCase();
  if (hex === '') return { ok: false, reason: 'Enter the verify code printed on the sheet.' };
  if (hex.startsWith('pkg')) {
    const digits = hex.slice(3);
    if (/^[0-9a-f]{12}$/.test(digits)) {
      return {
        ok: true,
        code: `PKG-${digits.slice(0, 4)}-${digits.slice(4, 8)}-${digits.slice(8)}`,
      };
    }
    if (/^[0-9a-f]{64}$/.test(digits)) return { ok: true, code: `PKG-${digits}` };
    return {
      ok: false,
      reason: 'A package code is PKG and 12 digits 0–9 or letters a–f, such as PKG-3f9a-0c11-7be2.',
    };
  }
  if (/^[0-9a-f]{12}$/.test(hex)) {
    return { ok: true, code: `${hex.slice(0, 4)}-${hex.slice(4, 8)}-${hex.slice(8)}` };
  }
  if (/^[0-9a-f]{64}$/.test(hex)) return { ok: true, code: hex };
  return {
    ok: false,
    reason: /[^0-9a-f]/.test(hex)
      ? 'A verify code has only the digits 0–9 and the letters a–f, such as abcd-ef01-2345.'
      : `That is ${hex.length} digits: a verify code has 12 (abcd-ef01-2345), a content hash 64.`,
  };
}

/** Whether a code in the address bar is an issue package's (PKG-…). */
export function isPackageCode(code: string): boolean {
  return /^pkg/i.test(code.replace(/[\s-]/g, ''));
}
