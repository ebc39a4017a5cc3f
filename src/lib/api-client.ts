import type { z } from 'zod';
import { apiErrorSchema } from '@shared/contracts/errors';
import { csrfResponseSchema } from '@shared/contracts/auth';

export type FieldErrors = Record<string, string>;

// Every failed request becomes this one error type, so screens only ever read
// `message` (for people) and `fields` (inline errors) and branch on `code`.
export class ApiRequestError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: FieldErrors | undefined;

  constructor(init: { status: number; code: string; message: string; fields?: FieldErrors }) {
    super(init.message);
    this.name = 'ApiRequestError';
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields;
  }
}

export function isApiRequestError(error: unknown): error is ApiRequestError {
  return error instanceof ApiRequestError;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export type RequestOptions = {
  method?: Method;
  body?: unknown;
  signal?: AbortSignal;
  /** Error statuses whose body is still an answer in `schema` (the health check's 503). */
  answerStatuses?: readonly number[];
};

const apiBase = '/api';

const unreachable = () =>
  new ApiRequestError({
    status: 0,
    code: 'network.unreachable',
    message: 'Motifold could not reach its server. Check your connection and try again.',
  });

// The CSRF token is bound to the session: fetched lazily, shared by concurrent requests, and
// dropped whenever the session changes (sign-in, sign-up, sign-out, accepting an invitation).
let csrfToken: string | null = null;
let csrfRequest: Promise<string> | null = null;

export function forgetCsrfToken(): void {
  csrfToken = null;
  csrfRequest = null;
}

// Exported for the upload helper (upload-request.ts), which sends through XMLHttpRequest.
export async function getCsrfToken(): Promise<string> {
  if (csrfToken) return csrfToken;
  csrfRequest ??= send('/auth/csrf', { method: 'GET' })
    .then((response) => readBody(response, csrfResponseSchema))
    .then(({ csrfToken: token }) => {
      csrfToken = token;
      return token;
    })
    .finally(() => {
      csrfRequest = null;
    });
  return csrfRequest;
}

const isAbort = (error: unknown) =>
  typeof error === 'object' && error !== null && 'name' in error && error.name === 'AbortError';

async function send(path: string, options: RequestOptions, token?: string): Promise<Response> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (options.body !== undefined) headers['content-type'] = 'application/json';
  if (token) headers['x-csrf-token'] = token;
  try {
    return await fetch(`${apiBase}${path}`, {
      method: options.method ?? 'GET',
      headers,
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (error) {
    if (isAbort(error)) throw error;
    throw unreachable();
  }
}

async function readError(response: Response): Promise<ApiRequestError> {
  return apiErrorFromText(response.status, await response.text().catch(() => ''));
}

// Reads an error answer from its status and body text; shared with the upload helper.
export function apiErrorFromText(status: number, text: string): ApiRequestError {
  let json: unknown = undefined;
  try {
    json = text ? JSON.parse(text) : undefined;
  } catch {
    // A proxy or crashed server answers with HTML or nothing; fall through to a generic message.
  }
  const parsed = apiErrorSchema.safeParse(json);
  if (parsed.success) return new ApiRequestError({ status, ...parsed.data.error });
  if (status === 0 || status === 502 || status === 503 || status === 504) return unreachable();
  return new ApiRequestError({
    status,
    code: 'response.unexpected',
    message: `Something went wrong on our side (HTTP ${status}). Try again in a moment.`,
  });
}

async function readBody<S extends z.ZodType>(
  response: Response,
  schema: S,
  answerStatuses: readonly number[] = [],
): Promise<z.output<S>> {
  if (!response.ok && !answerStatuses.includes(response.status)) throw await readError(response);
  const json: unknown = await response.json().catch(() => undefined);
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiRequestError({
      status: response.status,
      code: 'response.invalid',
      message: 'The server answered in a way this page does not understand. Reload the page and try again.',
    });
  }
  return parsed.data;
}

async function sendWithCsrf(path: string, options: RequestOptions): Promise<Response> {
  const method = options.method ?? 'GET';
  if (method === 'GET') return send(path, options);
  const response = await send(path, options, await getCsrfToken());
  if (response.status !== 403) return response;
  const error = await readError(response.clone());
  if (error.code !== 'csrf.invalid') return response;
  // The session changed under us (another tab signed in or out): fetch a fresh token, retry once.
  forgetCsrfToken();
  return send(path, options, await getCsrfToken());
}

export function apiRequest<S extends z.ZodType>(
  path: string,
  options: RequestOptions & { schema: S },
): Promise<z.output<S>>;
export function apiRequest(path: string, options?: RequestOptions): Promise<void>;
export async function apiRequest(
  path: string,
  options: RequestOptions & { schema?: z.ZodType } = {},
): Promise<unknown> {
  const response = await sendWithCsrf(path, options);
  if (options.schema) return readBody(response, options.schema, options.answerStatuses);
  if (!response.ok) throw await readError(response);
  return undefined;
}
