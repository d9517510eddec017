import type { z } from 'zod';
import type { ErrorDetail } from '../../shared/schemas/common';

/** An API failure carrying the server's `{ error: { code, message, details } }`. */
export class ApiRequestError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly details: ErrorDetail[] = [],
  ) {
    super(message);
  }
}

let csrfToken: string | null = null;

async function fetchCsrf(): Promise<string> {
  const res = await fetch('/api/auth/csrf', { credentials: 'same-origin' });
  const body = (await res.json()) as { token: string };
  csrfToken = body.token;
  return csrfToken;
}

export function setCsrfToken(token: string | null) {
  csrfToken = token;
}

type Options = { method?: string; body?: unknown; form?: FormData; signal?: AbortSignal };

async function send(path: string, opts: Options, retried = false): Promise<Response> {
  const method = opts.method ?? 'GET';
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (method !== 'GET') headers['X-CSRF-Token'] = csrfToken ?? (await fetchCsrf());
  if (opts.body !== undefined) headers['Content-Type'] = 'application/json';
  const res = await fetch(path, {
    method,
    headers,
    credentials: 'same-origin',
    signal: opts.signal,
    body: opts.form ?? (opts.body !== undefined ? JSON.stringify(opts.body) : undefined),
  });
  if (res.status === 403 && !retried && method !== 'GET') {
    const peek = (await res
      .clone()
      .json()
      .catch(() => null)) as { error?: { code?: string } } | null;
    if (peek?.error?.code === 'csrf') {
      await fetchCsrf();
      return send(path, opts, true);
    }
  }
  return res;
}

/** Calls the API; parses the answer with the shared zod schema when one is given, so drift fails loudly. */
export async function api<T = unknown>(path: string, opts: Options = {}, schema?: z.ZodType<T>): Promise<T> {
  const res = await send(path, opts);
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  const body = text ? JSON.parse(text) : undefined;
  if (!res.ok) {
    const err = body?.error ?? {};
    throw new ApiRequestError(
      res.status,
      err.code ?? 'http_' + res.status,
      err.message ?? res.statusText,
      Array.isArray(err.details) ? err.details : [],
    );
  }
  return schema ? schema.parse(body) : (body as T);
}
