import type { z } from 'zod';

import { apiErrorSchema, csrfResponseSchema } from '@/shared/schemas';

import { ApiError } from './ApiError';

const API_BASE = '/api/v1';

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export type RequestOptions = {
  method?: Method;
  /** Sent as JSON, or as multipart form data when it is a `FormData` (file uploads). */
  body?: unknown;
  signal?: AbortSignal;
};

let csrfToken: Promise<string> | null = null;

/** The session-bound CSRF token, fetched once and cached until `forgetCsrfToken`. */
function currentCsrfToken(): Promise<string> {
  if (csrfToken) return csrfToken;
  const pending = send('/auth/csrf', { method: 'GET' })
    .then((response) => readJson(response, csrfResponseSchema))
    .then(({ csrfToken: token }) => token);
  csrfToken = pending;
  pending.catch(() => {
    if (csrfToken === pending) csrfToken = null;
  });
  return pending;
}

/** Call after sign-in and sign-out: the server regenerates the session and with it the token. */
export function forgetCsrfToken(): void {
  csrfToken = null;
}

function send(path: string, { method = 'GET', body, signal }: RequestOptions, token?: string): Promise<Response> {
  const headers: Record<string, string> = { accept: 'application/json' };
  const multipart = body instanceof FormData;
  // The browser writes the multipart content type itself, with its boundary.
  if (body !== undefined && !multipart) headers['content-type'] = 'application/json';
  if (token) headers['x-csrf-token'] = token;
  return fetch(`${API_BASE}${path}`, {
    method,
    headers,
    body: body === undefined ? undefined : multipart ? body : JSON.stringify(body),
    credentials: 'same-origin',
    signal,
  });
}

async function toApiError(response: Response): Promise<ApiError> {
  const json: unknown = await response.json().catch(() => null);
  const parsed = apiErrorSchema.safeParse(json);
  if (parsed.success) {
    const { code, message, details } = parsed.data.error;
    return new ApiError(response.status, code, message, details);
  }
  return new ApiError(response.status, 'http_error', `The server answered ${response.status} ${response.statusText}`.trim());
}

async function readJson<T>(response: Response, schema: z.ZodType<T>): Promise<T> {
  if (!response.ok) throw await toApiError(response);
  const json: unknown = await response.json().catch(() => undefined);
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiError(response.status, 'invalid_response', 'The server answered in a shape this page does not understand. Reload and try again.');
  }
  return parsed.data;
}

async function sendWithCsrf(path: string, options: RequestOptions): Promise<Response> {
  if ((options.method ?? 'GET') === 'GET') return send(path, options);
  const response = await send(path, options, await currentCsrfToken());
  if (response.status !== 403) return response;
  const error = await toApiError(response.clone());
  if (error.code !== 'csrf_invalid') return response;
  forgetCsrfToken();
  return send(path, options, await currentCsrfToken());
}

/**
 * The one way the app talks to the API: JSON in and out, session cookie, CSRF header on changes
 * (retried once with a fresh token when the server calls it stale), errors as `ApiError`, and
 * answers checked against the shared zod schema.
 */
export async function apiRequest<T>(path: string, schema: z.ZodType<T>, options: RequestOptions = {}): Promise<T> {
  return readJson(await sendWithCsrf(path, options), schema);
}

/** For answers without a body (204): resolves when the server said yes. */
export async function apiSend(path: string, options: RequestOptions): Promise<void> {
  const response = await sendWithCsrf(path, options);
  if (!response.ok) throw await toApiError(response);
}
