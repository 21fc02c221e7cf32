/**
 * A verify code or a content hash as someone types it: dashes, spaces and
 * case do not matter (the server's rule, API.md `/verify/:code`). Returns the
 * form for the address bar (xxxx-xxxx-xxxx for a code, 64 hex for a hash), or
 * the reason it cannot be one.
 */
export function readVerifyCode(
  typed: string,
): { readonly ok: true; readonly code: string } | { readonly ok: false; readonly reason: string } {
  const hex = typed.replace(/[\s-]/g, '').toLowerCase();
  if (hex === '') return { ok: false, reason: 'Enter the verify code printed on the sheet.' };
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
