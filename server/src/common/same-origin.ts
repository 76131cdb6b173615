/**
 * Whether a browser request's Origin may use the API: the app's own origin
 * (APP_ORIGIN), or the origin the request was sent to (its Host header, so the
 * app served from any address it listens on, or behind a proxy that keeps
 * Host, still works). No Origin header means no browser page made the request
 * (curl, the test clients), which CORS has nothing to say about.
 */
export function isAllowedOrigin(origin: string | undefined, host: string | undefined, appOrigin: string): boolean {
  if (origin === undefined) return true;
  if (origin === appOrigin) return true;
  try {
    return host !== undefined && new URL(origin).host === host;
  } catch {
    return false;
  }
}
