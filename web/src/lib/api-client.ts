import { env } from '@/config/env';
import { getSession, type Session, setSession } from './session';

/** An answer from the API that was not 2xx, carrying the server's own message. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly messages: string[],
  ) {
    super(messages.join(' '));
    this.name = 'ApiError';
  }
}

/** The request never reached the server (no signal, server down). Nothing is signed out for this. */
export class OfflineError extends Error {
  constructor() {
    super('No connection to the server. Your work is kept on this device.');
    this.name = 'OfflineError';
  }
}

type Json = Record<string, unknown> | unknown[];

interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: Json;
  signal?: AbortSignal;
  /** Sign-in and refresh must not try to refresh on 401. */
  anonymous?: boolean;
}

let refreshing: Promise<Session | null> | null = null;

/** One refresh at a time: parallel 401s wait for the same new token instead of racing (and tripping reuse detection). */
export function refreshSession(): Promise<Session | null> {
  refreshing ??= (async () => {
    const session = getSession();
    if (!session) return null;
    try {
      const next = await send<Session>('/auth/refresh', { method: 'POST', body: { refreshToken: session.refreshToken }, anonymous: true });
      setSession(next);
      return next;
    } catch (err) {
      if (err instanceof ApiError && (err.status === 401 || err.status === 400)) {
        setSession(null);
        return null;
      }
      throw err;
    } finally {
      refreshing = null;
    }
  })();
  return refreshing;
}

async function send<T>(path: string, opts: RequestOptions, token?: string): Promise<T> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (opts.body !== undefined) headers['content-type'] = 'application/json';
  if (token) headers.authorization = `Bearer ${token}`;
  const res = await reach(`${env.apiBase}${path}`, {
    method: opts.method ?? 'GET',
    headers,
    body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
    signal: opts.signal,
  });
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  if (!res.ok) throw errorFrom(res.status, text);
  try {
    return (text ? JSON.parse(text) : undefined) as T;
  } catch {
    return undefined as T;
  }
}

async function reach(url: string, init: RequestInit): Promise<Response> {
  try {
    return await fetch(url, init);
  } catch (err) {
    if ((err as Error)?.name === 'AbortError') throw err;
    throw new OfflineError();
  }
}

/** The server's own message from an error body: Nest's `{ message }` JSON, or plain text. */
export function errorFrom(status: number, text: string): ApiError {
  let data: unknown;
  try {
    data = text ? JSON.parse(text) : undefined;
  } catch {
    data = undefined;
  }
  const message = (data as { message?: string | string[] } | undefined)?.message;
  // A short plain-text answer is the server's own words; an HTML error page is not worth showing.
  const plain = data === undefined && text.trim() && text.length < 500 && !text.trimStart().startsWith('<') ? text.trim() : undefined;
  const messages = Array.isArray(message) ? message : [message ?? plain ?? `The server answered ${status}.`];
  return new ApiError(status, messages);
}

/** Calls the API as the signed-in user, refreshing the access token once if it has expired. */
export async function apiRequest<T>(path: string, opts: RequestOptions = {}): Promise<T> {
  if (opts.anonymous) return send<T>(path, opts);
  return withRefresh((token) => send<T>(path, opts, token));
}

async function withRefresh<T>(call: (token?: string) => Promise<T>): Promise<T> {
  const session = getSession();
  try {
    return await call(session?.accessToken);
  } catch (err) {
    if (!(err instanceof ApiError) || err.status !== 401 || !session) throw err;
    const renewed = await refreshSession();
    if (!renewed) throw err;
    return call(renewed.accessToken);
  }
}

/** Fetches a file (a photo) as the signed-in user. */
export function apiBlob(path: string, signal?: AbortSignal): Promise<Blob> {
  return withRefresh(async (token) => {
    const res = await reach(`${env.apiBase}${path}`, { headers: token ? { authorization: `Bearer ${token}` } : {}, signal });
    if (!res.ok) throw errorFrom(res.status, await res.text());
    return res.blob();
  });
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>(path, { signal }),
  post: <T>(path: string, body?: Json) => apiRequest<T>(path, { method: 'POST', body }),
  patch: <T>(path: string, body: Json) => apiRequest<T>(path, { method: 'PATCH', body }),
  delete: <T>(path: string) => apiRequest<T>(path, { method: 'DELETE' }),
};
