import type { BrowserContext } from 'playwright-core';

/** Signs a person up through the API and returns their token. */
export async function signUp(url: string, name: string, email: string, password = 'upwelling season'): Promise<{ token: string; userId: string }> {
  const res = await fetch(`${url}/api/auth/register`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ name, email, password }) });
  if (!res.ok) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  const body = (await res.json()) as { accessToken: string; user: { id: string } };
  return { token: body.accessToken, userId: body.user.id };
}

/** Calls the API as a person. */
export async function apiAs<T>(url: string, token: string, path: string, body?: unknown, method = body === undefined ? 'GET' : 'POST'): Promise<T> {
  const res = await fetch(`${url}/api${path}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, ...(body === undefined ? {} : { 'Content-Type': 'application/json' }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path} failed: ${res.status} ${await res.text()}`);
  return (res.status === 204 ? undefined : await res.json()) as T;
}

/** Makes the browser context signed in as the person, as the sign-in page would. */
export async function signInContext(context: BrowserContext, token: string): Promise<void> {
  await context.addInitScript((t) => localStorage.setItem('upwell.accessToken', t), token);
}
