/** Pages an e-mailed link may open (verification, reset, invitation). */
const APP_PATHS = ['/verify', '/reset', '/invitation', '/sign-in', '/sign-up'] as const;

/**
 * The in-app path of a caught e-mail's link when it points at one of our pages
 * (on this or any host, as dev servers differ in port), else null for a foreign link.
 */
export function appHref(link: string, origin: string): string | null {
  let url: URL;
  try {
    url = new URL(link, origin);
  } catch {
    return null;
  }
  const ours = url.origin === origin || (APP_PATHS as ReadonlyArray<string>).includes(url.pathname);
  return ours ? `${url.pathname}${url.search}${url.hash}` : null;
}
