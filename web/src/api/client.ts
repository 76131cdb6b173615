/** The one way the web client talks to the server: JSON over fetch with the bearer token. */

const TOKEN_KEY = 'upwell.accessToken';

/** The stored access token, if signed in. */
export function getToken(): string | null {
  return localStorage.getItem(TOKEN_KEY);
}

/** Keeps or forgets the access token. */
export function setToken(token: string | null): void {
  if (token) localStorage.setItem(TOKEN_KEY, token);
  else localStorage.removeItem(TOKEN_KEY);
}

/** An error answer from the API, carrying its message for the person. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues: { path: string; message: string }[] = [],
  ) {
    super(message);
  }
}

/** Calls the API; resolves to the parsed JSON (or undefined for 204), rejects with ApiError. */
export async function api<T>(path: string, init: { method?: string; body?: unknown; signal?: AbortSignal } = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  const token = getToken();
  if (token) headers.Authorization = `Bearer ${token}`;
  if (init.body !== undefined) headers['Content-Type'] = 'application/json';
  let res: Response;
  try {
    res = await fetch(`/api${path}`, {
      method: init.method ?? 'GET',
      headers,
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      signal: init.signal,
    });
  } catch {
    throw new ApiError(0, 'Upwell’s server cannot be reached. Check your connection and try again.');
  }
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  const data = text ? safeJson(text) : undefined;
  if (!res.ok) {
    const body = (data ?? {}) as { message?: string; issues?: { path: string; message: string }[] };
    if (res.status === 401 && token) setToken(null);
    throw new ApiError(res.status, body.message ?? `the server answered ${res.status}`, body.issues);
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return { message: text.slice(0, 200) };
  }
}
