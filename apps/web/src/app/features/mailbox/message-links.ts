/** A link found in a message's text part. `route` is set when it points into this app. */
export interface MessageLink {
  href: string;
  route: { path: string; query: Record<string, string> } | null;
}

const URL_PATTERN = /https?:\/\/[^\s<>"')\]]+/g;

/**
 * The distinct http(s) links in `text`, in order. Links to `/account/…` (verification, reset) become in-app routes
 * so they open in this tab on whatever host the app is served from, even when the mail names another.
 */
export function messageLinks(text: string, appOrigin: string): MessageLink[] {
  const seen = new Set<string>();
  const links: MessageLink[] = [];
  for (const match of text.match(URL_PATTERN) ?? []) {
    const href = match.replace(/[.,;:!?]+$/, '');
    if (seen.has(href)) continue;
    seen.add(href);
    links.push({ href, route: appRoute(href, appOrigin) });
  }
  return links;
}

function appRoute(href: string, appOrigin: string): MessageLink['route'] {
  let url: URL;
  try {
    url = new URL(href);
  } catch {
    return null;
  }
  if (url.origin !== appOrigin && !url.pathname.startsWith('/account/')) return null;
  return { path: url.pathname, query: Object.fromEntries(url.searchParams) };
}
