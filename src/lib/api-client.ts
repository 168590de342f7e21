import type { z } from 'zod';
import { errorCodes, errorEnvelopeSchema, type ErrorCode } from '../../shared/errors';
import { csrfResponseSchema } from '../../shared/schemas/auth';
import { noteReadAnswer } from './saved-copy';

/** Codes the server sends (shared/errors.ts) plus two the client itself produces. */
export type ApiErrorCode = ErrorCode | 'network' | 'bad_response';

/** A code this client does not know (a newer server's) reads as the nearest one it does. */
const knownCode = (code: string, status: number): ErrorCode =>
  (errorCodes as readonly string[]).includes(code) ? (code as ErrorCode) : status >= 500 ? 'internal' : 'bad_request';

/** Every failed call ends up as one of these, whatever went wrong on the way. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: ApiErrorCode;
  readonly fields: Record<string, string>;

  constructor(status: number, code: ApiErrorCode, message: string, fields: Record<string, string> = {}) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

type Query = Record<string, string | number | boolean | undefined | null>;
type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

interface RequestOptions {
  body?: unknown;
  query?: Query;
  signal?: AbortSignal;
}

let csrfToken: Promise<string> | null = null;

async function fetchCsrfToken(): Promise<string> {
  const response = await safeFetch('/api/auth/csrf', { method: 'GET', credentials: 'same-origin' });
  if (!response.ok) throw await toApiError(response);
  return parseBody(response, csrfResponseSchema).then((body) => body.token);
}

/** The token is fetched once and shared; a failed fetch is forgotten so the next call tries again. */
function getCsrfToken(): Promise<string> {
  if (!csrfToken) {
    csrfToken = fetchCsrfToken().catch((error: unknown) => {
      csrfToken = null;
      throw error;
    });
  }
  return csrfToken;
}

/** Sign-in and sign-out rotate the session, so the token is fetched afresh after them. */
export async function refreshCsrfToken(): Promise<string> {
  csrfToken = null;
  return getCsrfToken();
}

function buildUrl(path: string, query?: Query): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null) params.set(key, String(value));
  }
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

async function safeFetch(url: string, init: RequestInit): Promise<Response> {
  try {
    return await fetch(url, init);
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, 'network', 'Could not reach Boothwright. Check the connection and try again.');
  }
}

async function toApiError(response: Response): Promise<ApiError> {
  const text = await response.text().catch(() => '');
  try {
    const parsed = errorEnvelopeSchema.safeParse(JSON.parse(text));
    if (parsed.success) {
      const { code, message, fields } = parsed.data.error;
      return new ApiError(response.status, knownCode(code, response.status), message, fields ?? {});
    }
  } catch {
    // Not JSON (a proxy page, an empty body): fall through to a generic error.
  }
  return new ApiError(response.status, response.status >= 500 ? 'internal' : 'bad_request', response.statusText || 'Request failed');
}

async function parseBody<S extends z.ZodType>(response: Response, schema: S): Promise<z.output<S>> {
  let json: unknown;
  try {
    json = await response.json();
  } catch {
    throw new ApiError(response.status, 'bad_response', 'The server sent an answer the app could not read.');
  }
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiError(response.status, 'bad_response', 'The server sent an answer in an unexpected shape.');
  }
  return parsed.data;
}

async function send(method: Method, path: string, options: RequestOptions, retried = false): Promise<Response> {
  const headers: Record<string, string> = { accept: 'application/json' };
  // FormData goes as it is, so the browser writes the multipart content-type with its boundary.
  const isForm = options.body instanceof FormData;
  if (options.body !== undefined && !isForm) headers['content-type'] = 'application/json';
  if (method !== 'GET') headers['x-csrf-token'] = await getCsrfToken();

  const url = buildUrl(path, options.query);
  const response = await safeFetch(url, {
    method,
    headers,
    credentials: 'same-origin',
    body: options.body === undefined ? undefined : isForm ? (options.body as FormData) : JSON.stringify(options.body),
    signal: options.signal,
  });
  if (response.ok) {
    if (method === 'GET') noteReadAnswer(url, response);
    return response;
  }

  const error = await toApiError(response);
  if (error.status === 403 && error.code === 'csrf_invalid' && !retried) {
    await refreshCsrfToken();
    return send(method, path, options, true);
  }
  throw error;
}

/** Sends a request and parses the success body with the schema given. */
export async function apiRequest<S extends z.ZodType>(method: Method, path: string, schema: S, options: RequestOptions = {}): Promise<z.output<S>> {
  const response = await send(method, path, options);
  return parseBody(response, schema);
}

/** For calls that answer 204 No Content (sign-out). */
export async function apiRequestNoContent(method: Method, path: string, options: RequestOptions = {}): Promise<void> {
  await send(method, path, options);
}

export const apiClient = {
  get: <S extends z.ZodType>(path: string, schema: S, options?: Omit<RequestOptions, 'body'>) => apiRequest('GET', path, schema, options),
  post: <S extends z.ZodType>(path: string, body: unknown, schema: S) => apiRequest('POST', path, schema, { body }),
  patch: <S extends z.ZodType>(path: string, body: unknown, schema: S) => apiRequest('PATCH', path, schema, { body }),
  /** Multipart upload (files); same CSRF, credentials and error handling as the JSON calls. */
  postForm: <S extends z.ZodType>(path: string, formData: FormData, schema: S) => apiRequest('POST', path, schema, { body: formData }),
};
