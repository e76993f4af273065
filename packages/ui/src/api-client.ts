/**
 * The one way the Fryline front ends talk to the API: same-origin fetch,
 * JSON in and out, a CSRF token on every request that changes something,
 * and one typed error for anything that is not a 2xx.
 *
 * Framework-free on purpose, so both apps share it as source.
 */

export interface ApiErrorInit {
  status: number;
  code: string;
  message: string;
  details?: unknown;
}

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown;
  /** Field errors from `details.fields`, as `{ path: message }`. */
  readonly fieldErrors: Record<string, string>;

  constructor(init: ApiErrorInit) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.details = init.details;
    this.fieldErrors = readFieldErrors(init.details);
  }
}

export function isApiError(error: unknown, code?: string): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}

/** A string-valued entry of the error's details, e.g. `detailString(err, 'orderId')`. */
export function detailString(error: unknown, key: string): string | undefined {
  if (!(error instanceof ApiError) || !isRecord(error.details)) return undefined;
  const value = error.details[key];
  return typeof value === 'string' ? value : undefined;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function readFieldErrors(details: unknown): Record<string, string> {
  if (!isRecord(details) || !isRecord(details.fields)) return {};
  const out: Record<string, string> = {};
  for (const [path, message] of Object.entries(details.fields)) {
    if (typeof message === 'string') out[path] = message;
  }
  return out;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

const CSRF_PATH = '/api/csrf';
let csrfToken: Promise<string> | null = null;

function fetchCsrfToken(): Promise<string> {
  csrfToken ??= send('GET', CSRF_PATH)
    .then((res) => readBody<{ token?: unknown }>(res))
    .then((body) => {
      if (typeof body?.token !== 'string') {
        throw new ApiError({ status: 0, code: 'csrf', message: 'The server did not hand out a security token.' });
      }
      return body.token;
    })
    .catch((error: unknown) => {
      csrfToken = null;
      throw error;
    });
  return csrfToken;
}

/** Extra request headers, e.g. an Idempotency-Key. */
export interface RequestOptions {
  headers?: Record<string, string>;
}

async function send(method: Method, path: string, body?: unknown, token?: string, extra: RequestOptions = {}): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json', ...extra.headers };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (token !== undefined) headers['X-CSRF-Token'] = token;
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError({
      status: 0,
      code: 'network',
      message: 'We could not reach Fryline. Check your connection and try again.',
    });
  }
  if (!res.ok) throw await toApiError(res);
  return res;
}

async function readBody<T>(res: Response): Promise<T | undefined> {
  if (res.status === 204) return undefined;
  const text = await res.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text) as T;
  } catch {
    throw new ApiError({ status: res.status, code: 'bad_response', message: 'The server sent a reply we could not read.' });
  }
}

async function toApiError(res: Response): Promise<ApiError> {
  let parsed: unknown;
  try {
    parsed = await res.json();
  } catch {
    parsed = undefined;
  }
  const error = isRecord(parsed) && isRecord(parsed.error) ? parsed.error : undefined;
  if (error && typeof error.code === 'string' && typeof error.message === 'string') {
    return new ApiError({ status: res.status, code: error.code, message: error.message, details: error.details });
  }
  return new ApiError({
    status: res.status,
    code: res.status >= 500 ? 'unavailable' : `http_${res.status}`,
    message:
      res.status >= 500
        ? 'Fryline is not answering right now. Please try again in a moment.'
        : `The request failed (HTTP ${res.status}).`,
  });
}

async function request<T>(method: Method, path: string, body?: unknown, options: RequestOptions = {}): Promise<T> {
  if (method === 'GET') return (await readBody<T>(await send(method, path, undefined, undefined, options))) as T;
  try {
    return (await readBody<T>(await send(method, path, body, await fetchCsrfToken(), options))) as T;
  } catch (error) {
    if (!(isApiError(error, 'csrf') && error.status === 403)) throw error;
    // The session's token changed (for example after signing in): fetch a new one and retry once.
    csrfToken = null;
    return (await readBody<T>(await send(method, path, body, await fetchCsrfToken(), options))) as T;
  }
}

export const api = {
  get: <T>(path: string) => request<T>('GET', path),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('POST', path, body ?? {}, options),
  put: <T>(path: string, body: unknown) => request<T>('PUT', path, body),
  patch: <T>(path: string, body: unknown) => request<T>('PATCH', path, body),
  delete: <T = void>(path: string) => request<T>('DELETE', path),
};

/**
 * Puts the server's field errors onto the matching fields of a form
 * (react-hook-form's `setError` fits the `setError` parameter). Returns what
 * the form should still say above its fields: field messages that no listed
 * field took, or the error's own message when it named no fields.
 */
export function putFieldErrors<N extends string>(
  error: unknown,
  setError: (name: N, error: { type: string; message: string }) => void,
  fields: readonly N[],
): string[] {
  if (!(error instanceof ApiError)) return [errorMessage(error)];
  const entries = Object.entries(error.fieldErrors);
  if (entries.length === 0) return [error.message];
  const leftOver: string[] = [];
  for (const [path, message] of entries) {
    const field = fields.find((name) => name === path);
    if (field === undefined) leftOver.push(message);
    else setError(field, { type: 'server', message });
  }
  return leftOver;
}

/** A message fit to show a person, whatever was thrown. */
export function errorMessage(error: unknown): string {
  return error instanceof ApiError ? error.message : 'Something went wrong. Please try again.';
}

/**
 * React Query's retry rule for both apps: ask again (twice at most) only when
 * the trouble was on the way (no connection, a server error); a 4xx answer
 * would come back the same.
 */
export function shouldRetry(failures: number, error: unknown): boolean {
  const transient = !(error instanceof ApiError) || error.status === 0 || error.status >= 500;
  return transient && failures < 2;
}

/** `GET /api/me`: the signed-in user, or null when nobody is signed in. */
export async function fetchCurrentUser<T>(): Promise<T | null> {
  try {
    return await api.get<T>('/api/me');
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}
