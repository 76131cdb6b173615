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

/** Uploads a CSV through the API and stores its columns as series (or new versions of `targets`). */
export async function uploadCsvSeries(
  url: string,
  token: string,
  groupId: string,
  fileName: string,
  csv: string,
  columns: { column: string; name: string; kind: string; units: string }[],
  targets: Record<string, string> = {},
): Promise<{ id: string; name: string; version: number }[]> {
  const form = new FormData();
  form.append('file', new Blob([csv], { type: 'text/csv' }), fileName);
  const res = await fetch(`${url}/api/groups/${groupId}/uploads`, { method: 'POST', headers: { Authorization: `Bearer ${token}` }, body: form });
  if (!res.ok) throw new Error(`upload failed: ${res.status} ${await res.text()}`);
  const preview = (await res.json()) as { uploadId: string };
  const body = { origin: 'model-output', targets, columns: columns.map((c) => ({ ...c, skip: false, variable: c.column })) };
  const imported = await apiAs<{ series: { id: string; name: string; version: number }[] }>(url, token, `/uploads/${preview.uploadId}/import`, body);
  return imported.series;
}

/** A monthly index with warm and cold swings and a carbon flux answering it `lag` months later (seeded, no randomness). */
export function indexAndFluxCsv(lag: number, months = 480): string {
  const lines = ['date,sector_index,air_sea_flux'];
  const index = (t: number) => 1.6 * Math.sin((2 * Math.PI * t) / 47) + 0.4 * Math.sin((2 * Math.PI * t) / 19);
  for (let t = 0; t < months; t++) {
    const y = 1980 + Math.floor(t / 12);
    const m = String((t % 12) + 1).padStart(2, '0');
    const flux = 0.5 + 0.05 * Math.cos((2 * Math.PI * t) / 12) - 0.12 * index(t - lag);
    lines.push(`${y}-${m},${index(t).toFixed(5)},${flux.toFixed(5)}`);
  }
  return lines.join('\n') + '\n';
}
