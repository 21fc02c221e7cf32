/**
 * The one fetch wrapper: JSON in and out, the API's error format turned into
 * ApiError, the CSRF header on every write, and a silent session refresh.
 */
export interface ApiFieldError {
  readonly path: string;
  readonly message: string;
}

export class ApiError extends Error {
  override readonly name = 'ApiError';
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: readonly ApiFieldError[] = [],
    readonly body: unknown = undefined,
  ) {
    super(message);
  }
}

/** Thrown when the server cannot be reached at all. */
export class ConnectionError extends Error {
  override readonly name = 'ConnectionError';
}

const WRITE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
// Routes that sign in or refresh themselves: a 401 there is the answer, not an expired session.
const NO_REFRESH = ['/auth/sign-in', '/auth/refresh', '/auth/accept-invitation', '/auth/password-'];

/** The readable double-submit cookie the API sets beside the session (API.md, Auth). */
export function csrfToken(): string | undefined {
  const match = /(?:^|;\s*)hl_csrf=([^;]*)/.exec(document.cookie);
  return match?.[1] ? decodeURIComponent(match[1]) : undefined;
}

type SessionListener = () => void;
const sessionLostListeners = new Set<SessionListener>();

/** Called when a refresh fails: the session is gone (signed out elsewhere, expired). */
export function onSessionLost(listener: SessionListener): () => void {
  sessionLostListeners.add(listener);
  return () => sessionLostListeners.delete(listener);
}

/** Tells the listeners the session is gone (for requests made outside apiFetch: uploads). */
export function notifySessionLost(): void {
  sessionLostListeners.forEach((l) => l());
}

let refreshing: Promise<boolean> | null = null;

/**
 * One refresh at a time: parallel requests that meet an expired access token
 * all wait for the same POST /auth/refresh (the refresh token rotates, so a
 * second concurrent refresh would present a token already used).
 */
export function refreshSession(): Promise<boolean> {
  refreshing ??= (async () => {
    try {
      const response = await fetch('/api/auth/refresh', {
        method: 'POST',
        credentials: 'same-origin',
        headers: withCsrf({ accept: 'application/json' }),
      });
      return response.ok;
    } catch {
      return false;
    } finally {
      refreshing = null;
    }
  })();
  return refreshing;
}

function withCsrf(headers: Record<string, string>): Record<string, string> {
  const token = csrfToken();
  return token ? { ...headers, 'x-csrf-token': token } : headers;
}

async function send(path: string, init: RequestInit): Promise<Response> {
  const method = (init.method ?? 'GET').toUpperCase();
  const isJson = init.body !== undefined && typeof init.body === 'string';
  let headers: Record<string, string> = {
    accept: 'application/json',
    ...(isJson ? { 'content-type': 'application/json' } : {}),
    ...(init.headers as Record<string, string> | undefined),
  };
  if (WRITE_METHODS.has(method)) headers = withCsrf(headers);
  try {
    return await fetch(`/api${path}`, { credentials: 'same-origin', ...init, method, headers });
  } catch {
    throw new ConnectionError('cannot reach the Hoopline server');
  }
}

async function readBody(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** The API's error body (or none) as an ApiError. */
export function toApiError(status: number, body: unknown): ApiError {
  const error = (
    body as { error?: { code?: string; message?: string; fields?: ApiFieldError[] } } | undefined
  )?.error;
  return new ApiError(
    status,
    error?.code ?? 'http_error',
    error?.message ?? `the server answered ${status}`,
    error?.fields ?? [],
    body,
  );
}

/**
 * Sends a request; a 401 on an ordinary route means the 5-minute access token
 * has expired (code `token_expired`, or no access cookie at all once the
 * browser has dropped it): refresh once and retry once. A refused refresh
 * tells the session-lost listeners and throws the 401.
 */
async function sendWithRefresh(path: string, init: RequestInit): Promise<Response> {
  const response = await send(path, init);
  if (response.status !== 401 || NO_REFRESH.some((p) => path.startsWith(p))) return response;
  const body = await readBody(response);
  if (await refreshSession()) return send(path, init);
  notifySessionLost();
  throw toApiError(401, body);
}

/** Calls the API and reads its JSON answer; an error status becomes an ApiError. */
export async function apiFetch<T>(path: string, init: RequestInit = {}): Promise<T> {
  const response = await sendWithRefresh(path, init);
  const body = await readBody(response);
  if (!response.ok) throw toApiError(response.status, body);
  return body as T;
}

/** A file the API sent: its bytes and the name the server gave it. */
export interface DownloadedFile {
  readonly blob: Blob;
  /** From Content-Disposition (RFC 6266 `filename*` first); null when the server named none. */
  readonly fileName: string | null;
  readonly headers: Headers;
}

/**
 * Downloads a file through the same path as every other call, so an expired
 * access token is refreshed first (a plain link would just fail with a 401).
 */
export async function apiDownload(path: string): Promise<DownloadedFile> {
  const response = await sendWithRefresh(path, { headers: { accept: '*/*' } });
  if (!response.ok) throw toApiError(response.status, await readBody(response));
  return {
    blob: await response.blob(),
    fileName: fileNameFromDisposition(response.headers.get('content-disposition')),
    headers: response.headers,
  };
}

/**
 * The file name of a Content-Disposition header: the UTF-8 `filename*` of
 * RFC 6266 / RFC 8187 when present, else the plain `filename`.
 */
export function fileNameFromDisposition(header: string | null): string | null {
  if (!header) return null;
  const extended = /filename\*\s*=\s*([^']*)'[^']*'([^;]+)/i.exec(header);
  if (extended?.[2]) {
    try {
      return decodeURIComponent(extended[2].trim());
    } catch {
      // A malformed escape: fall back to the plain name.
    }
  }
  const plain = /filename\s*=\s*(?:"((?:[^"\\]|\\.)*)"|([^;]+))/i.exec(header);
  const name = plain?.[1]?.replace(/\\(.)/g, '$1') ?? plain?.[2]?.trim();
  return name ? name : null;
}

/** Hands a downloaded file to the browser to save, under the given name. */
export function saveFile(file: DownloadedFile, fallbackName: string): void {
  saveBlob(file.blob, file.fileName ?? fallbackName);
}

/** Hands bytes made in the browser (an exported case) to it to save as a file. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Revoked later, not at once: a browser may still be reading the blob after the click returns.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** JSON body helper: `apiFetch(path, json('POST', {...}))`. */
export function json(method: 'POST' | 'PUT' | 'PATCH' | 'DELETE', body?: unknown): RequestInit {
  return body === undefined ? { method } : { method, body: JSON.stringify(body) };
}

/** Query string from the defined, non-empty values. */
export function query(params: Record<string, string | number | undefined | null>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== null && value !== '') search.set(key, String(value));
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}

/** The API's page envelope. */
export interface Page<T> {
  readonly items: readonly T[];
  readonly page: number;
  readonly pageSize: number;
  readonly total: number;
}
