// Where to go after signing in: only a path of this site. Anything that could leave it — another
// origin, a protocol-relative `//host`, a backslash that browsers read as a slash (`/\host`), control
// characters — lands on the safe default instead.

const PLACEHOLDER = 'http://setline.invalid';

/** A same-origin path (with its query and fragment) or `fallback`. */
export function safeCallbackPath(value: string | null | undefined, fallback = '/'): string {
  if (typeof value !== 'string' || value.length === 0 || value.length > 2000) return fallback;
  if (!value.startsWith('/') || value.startsWith('//') || value.includes('\\') || /[\u0000-\u001f\u007f]/.test(value))
    return fallback;
  let url: URL;
  try {
    url = new URL(value, PLACEHOLDER);
  } catch {
    return fallback;
  }
  if (url.origin !== PLACEHOLDER) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}

/** next-auth's redirect callback: a path or an address of this site, else the site's root. */
export function safeRedirect(url: string, baseUrl: string): string {
  const base = baseUrl.replace(/\/+$/, '');
  if (url.startsWith('/')) return `${base}${safeCallbackPath(url)}`;
  try {
    const target = new URL(url);
    if (target.origin === new URL(base).origin && !url.includes('\\'))
      return `${base}${safeCallbackPath(`${target.pathname}${target.search}${target.hash}`)}`;
  } catch {
    // not a URL: the default below
  }
  return base;
}
