/** The one fetch wrapper: JSON in and out, the API's error format turned into ApiError. */
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

export async function apiFetch<T>(path: string, init: RequestInit = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      credentials: 'same-origin',
      ...init,
      headers: {
        accept: 'application/json',
        ...(init.body ? { 'content-type': 'application/json' } : {}),
        ...init.headers,
      },
    });
  } catch {
    throw new ConnectionError('cannot reach the Hoopline server');
  }
  const text = await response.text();
  let body: unknown = undefined;
  if (text) {
    try {
      body = JSON.parse(text);
    } catch {
      body = undefined;
    }
  }
  if (!response.ok) {
    const error = (
      body as { error?: { code?: string; message?: string; fields?: ApiFieldError[] } }
    )?.error;
    throw new ApiError(
      response.status,
      error?.code ?? 'http_error',
      error?.message ?? `the server answered ${response.status}`,
      error?.fields ?? [],
      body,
    );
  }
  return body as T;
}
