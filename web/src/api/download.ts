import { ApiError, getToken } from './client';

/** Downloads an API resource as a file (the bearer token cannot ride on a plain link). */
export async function downloadFile(path: string, fallbackName: string): Promise<void> {
  const token = getToken();
  // Public files (a shared snapshot) are fetched without a token rather than with an empty one.
  const res = await fetch(`/api${path}`, { headers: token ? { Authorization: `Bearer ${token}` } : {} });
  if (!res.ok) throw new ApiError(res.status, ((await res.json().catch(() => ({}))) as { message?: string }).message ?? 'download failed');
  const name = /filename="([^"]+)"/.exec(res.headers.get('Content-Disposition') ?? '')?.[1] ?? fallbackName;
  const url = URL.createObjectURL(await res.blob());
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.click();
  URL.revokeObjectURL(url);
}
