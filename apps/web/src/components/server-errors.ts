import { ApiError, ConnectionError } from '../api/client';

/**
 * The server's 400 `fields` as a formik errors object: each dotted path
 * becomes a nested key (`site.altitude` → { site: { altitude } }), paths under
 * `prefix` lose it. Returns the fields matched and a form-level message.
 */
export function serverFieldErrors(
  error: unknown,
  knownFields: readonly string[],
  options: { prefix?: string; aliases?: Readonly<Record<string, string>> } = {},
): { fields: Record<string, string>; message: string | null } {
  const prefix = options.prefix ?? '';
  if (error instanceof ConnectionError) {
    return {
      fields: {},
      message: 'Cannot reach the Hoopline server. Check the connection and try again.',
    };
  }
  if (!(error instanceof ApiError)) {
    return {
      fields: {},
      message: error instanceof Error ? error.message : 'Something went wrong.',
    };
  }
  const fields: Record<string, string> = {};
  const unmatched: string[] = [];
  for (const f of error.fields) {
    const path = prefix && f.path.startsWith(prefix) ? f.path.slice(prefix.length) : f.path;
    const aliased = Object.entries(options.aliases ?? {}).find(
      ([from]) => path === from || path.startsWith(`${from}.`),
    );
    const target = aliased ? aliased[1] : path;
    const key = knownFields.find((k) => target === k || target.startsWith(`${k}.`));
    if (key && !fields[key]) fields[key] = f.message;
    else if (!key) unmatched.push(f.path ? `${f.path}: ${f.message}` : f.message);
  }
  const hasFields = Object.keys(fields).length > 0;
  const message =
    unmatched.length > 0
      ? `${error.message}${error.message.endsWith('.') ? '' : '.'} ${unmatched.join('; ')}`
      : hasFields
        ? null
        : messageFor(error);
  return { fields, message };
}

/** A sentence for an API error a person can act on. */
export function messageFor(error: unknown): string {
  if (error instanceof ConnectionError)
    return 'Cannot reach the Hoopline server. Check the connection and try again.';
  if (error instanceof ApiError) {
    switch (error.code) {
      case 'stale_version':
        return 'Someone else changed this in the meantime. Reload to see their version, then make your change again.';
      case 'too_many_attempts':
        return 'Too many attempts. Wait a minute and try again.';
      case 'csrf_failed':
        return 'Your session token is out of date. Reload the page and try again.';
      default:
        return error.message;
    }
  }
  return error instanceof Error ? error.message : 'Something went wrong.';
}
