import type { ZodType } from 'zod';
import { apiErrorSchema } from '@shared/schemas/auth';

/** One field problem as the server reports it in `error.details` for validation errors. */
export interface FieldIssue {
  path: string;
  message: string;
}

/** Status used when no HTTP reply arrived at all (offline, server down, CORS, DNS). */
export const NETWORK_FAILURE_STATUS = 0;

const NETWORK_MESSAGE = 'Cannot reach the Porelith server. Check your connection and try again.';

/**
 * An API call that did not succeed. `message` is ready to show to a person;
 * `code` is the server's machine-readable reason (e.g. `invalid_credentials`).
 * @example
 * try { await api.get('/api/auth/me') } catch (e) { if (e instanceof ApiClientError && e.status === 401) … }
 */
export class ApiClientError extends Error {
  override readonly name = 'ApiClientError';

  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: FieldIssue[] = [],
  ) {
    super(message);
  }

  /** Message for one form field, matched on the first path segment (`email`, `role`…). */
  fieldMessage(field: string): string | undefined {
    return this.details.find((d) => d.path === field || d.path.split('.')[0] === field)?.message;
  }
}

function isFieldIssue(value: unknown): value is FieldIssue {
  return (
    typeof value === 'object' &&
    value !== null &&
    typeof (value as FieldIssue).path === 'string' &&
    typeof (value as FieldIssue).message === 'string'
  );
}

/**
 * Turns the `details` of an error reply into field issues, ignoring anything of another shape.
 * @example toFieldIssues([{ path: 'email', message: 'is required' }, 42]) // [{ path: 'email', … }]
 */
export function toFieldIssues(details: unknown): FieldIssue[] {
  return Array.isArray(details) ? details.filter(isFieldIssue) : [];
}

/**
 * A readable sentence for an error reply: field issues win over the generic message
 * because they tell the person what to change.
 * @example describeApiError('Invalid body', [{ path: 'email', message: 'must be a valid e-mail address' }])
 * // 'email: must be a valid e-mail address'
 */
export function describeApiError(message: string, details: FieldIssue[]): string {
  if (details.length === 0) return message;
  return details.map((d) => (d.path ? `${d.path}: ${d.message}` : d.message)).join('; ');
}

/** What the server says when the reply carries no usable `{ error }` body (proxy pages, crashes). */
function fallbackMessage(status: number): string {
  if (status === 429) return 'Too many attempts. Wait a minute and try again.';
  if (status >= 500) return `The server ran into a problem (HTTP ${status}). Try again shortly.`;
  return `The request failed (HTTP ${status}).`;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text.trim() === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** The reply checked against its contract; a mismatch names the first field that did not fit. */
function checkedReply<T>(status: number, schema: ZodType<T>, data: unknown): T {
  const checked = schema.safeParse(data);
  if (checked.success) return checked.data;
  const first = checked.error.issues[0];
  const where = first && first.path.length > 0 ? `${first.path.join('.')}: ` : '';
  throw new ApiClientError(
    status,
    'unexpected_reply',
    `The server sent a reply this page does not understand (${where}${first?.message ?? 'invalid'}).`,
  );
}

async function errorFromResponse(response: Response): Promise<ApiClientError> {
  const parsed = apiErrorSchema.safeParse(await readJson(response));
  if (!parsed.success) {
    return new ApiClientError(response.status, `http_${response.status}`, fallbackMessage(response.status));
  }
  const { code, message, details } = parsed.data.error;
  const issues = toFieldIssues(details);
  return new ApiClientError(response.status, code, describeApiError(message, issues), issues);
}

export type HttpMethod = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions<T> {
  body?: unknown;
  /** Checks the reply against the shared contract; without it the reply is returned as `unknown`-typed T. */
  schema?: ZodType<T>;
  signal?: AbortSignal;
}

export interface ApiClient {
  request<T>(method: HttpMethod, path: string, options?: RequestOptions<T>): Promise<T>;
  get<T>(path: string, schema?: ZodType<T>): Promise<T>;
  post<T>(path: string, body?: unknown, schema?: ZodType<T>): Promise<T>;
  patch<T>(path: string, body?: unknown, schema?: ZodType<T>): Promise<T>;
  del(path: string): Promise<void>;
}

export interface ApiClientOptions {
  /** Injected for tests; defaults to the global fetch, looked up per call so stubs apply. */
  fetchImpl?: typeof fetch;
  baseUrl?: string;
  /**
   * Called when a non-auth endpoint answers 401: the session ended while the page was open.
   * Auth endpoints are left out because 401 is their normal "not signed in" or "wrong password" answer.
   */
  onSessionExpired?: (error: ApiClientError) => void;
}

/**
 * Builds the JSON client every `src/api/*` module uses. Cookies ride along (same origin only).
 * @example
 * const client = createApiClient({ fetchImpl: fakeFetch });
 * const me = await client.get('/api/auth/me', sessionSchema);
 */
export function createApiClient(options: ApiClientOptions = {}): ApiClient {
  const baseUrl = options.baseUrl ?? '';
  const doFetch: typeof fetch = options.fetchImpl ?? ((input, init) => globalThis.fetch(input, init));

  async function request<T>(method: HttpMethod, path: string, opts: RequestOptions<T> = {}): Promise<T> {
    const headers: Record<string, string> = { Accept: 'application/json' };
    const init: RequestInit = { method, headers, credentials: 'same-origin', signal: opts.signal };
    if (opts.body !== undefined) {
      headers['Content-Type'] = 'application/json';
      init.body = JSON.stringify(opts.body);
    }

    let response: Response;
    try {
      response = await doFetch(baseUrl + path, init);
    } catch (cause) {
      if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
      throw new ApiClientError(NETWORK_FAILURE_STATUS, 'network_error', NETWORK_MESSAGE);
    }

    if (!response.ok) {
      const error = await errorFromResponse(response);
      if (error.status === 401 && !path.startsWith('/api/auth/')) options.onSessionExpired?.(error);
      throw error;
    }
    if (response.status === 204) return undefined as T;

    const data = await readJson(response);
    return opts.schema ? checkedReply(response.status, opts.schema, data) : (data as T);
  }

  return {
    request,
    get: (path, schema) => request('GET', path, { schema }),
    post: (path, body, schema) => request('POST', path, { body, schema }),
    patch: (path, body, schema) => request('PATCH', path, { body, schema }),
    del: async (path) => {
      await request<void>('DELETE', path);
    },
  };
}

let sessionExpiredHandler: ((error: ApiClientError) => void) | null = null;

/**
 * Registers what the app does when its session runs out mid-use (main.ts sends the person to sign-in).
 * @example onSessionExpired(() => router.push('/sign-in'));
 */
export function onSessionExpired(handler: ((error: ApiClientError) => void) | null): void {
  sessionExpiredHandler = handler;
}

/** The app-wide client. */
export const api: ApiClient = createApiClient({ onSessionExpired: (error) => sessionExpiredHandler?.(error) });

export interface MultipartOptions<T> {
  schema: ZodType<T>;
  /** The message for a refusal whose body is not our `{ error }` shape (a proxy's page, a crash). */
  bareFailure: (status: number) => string;
  /** The error for a well-formed `{ error }` refusal; by default an ApiClientError naming the fields. */
  toError?: (status: number, code: string, message: string, details: unknown) => Error;
  fetchImpl?: typeof fetch;
}

/**
 * A multipart POST (a file upload). The JSON client cannot carry a file, so this calls fetch itself, with the
 * same cookie rule, the same error shape and the same "session ended" handling.
 * @example const layer = await postMultipart(`/api/teams/${teamId}/layers`, form, { schema: referenceLayerSchema, bareFailure });
 */
export async function postMultipart<T>(url: string, form: FormData, o: MultipartOptions<T>): Promise<T> {
  const fetchImpl = o.fetchImpl ?? ((input, init) => globalThis.fetch(input, init));
  let response: Response;
  try {
    response = await fetchImpl(url, { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } });
  } catch {
    throw new ApiClientError(NETWORK_FAILURE_STATUS, 'network_error', NETWORK_MESSAGE);
  }
  const body = await readJson(response);
  if (!response.ok) {
    const parsed = apiErrorSchema.safeParse(body);
    let error: Error;
    if (!parsed.success) error = new ApiClientError(response.status, `http_${response.status}`, o.bareFailure(response.status));
    else {
      const { code, message, details } = parsed.data.error;
      const issues = toFieldIssues(details);
      error = o.toError
        ? o.toError(response.status, code, message, details)
        : new ApiClientError(response.status, code, describeApiError(message, issues), issues);
    }
    if (response.status === 401 && error instanceof ApiClientError) sessionExpiredHandler?.(error);
    throw error;
  }
  return checkedReply(response.status, o.schema, body);
}
