const DEFAULT_DESTINATION = '/circuits';

/**
 * Keeps the post-sign-in destination on our own site, so a crafted link cannot bounce a
 * freshly signed-in user to another origin. Absolute URLs are reduced to their path.
 */
export function safeCallbackUrl(raw: string | string[] | undefined): string {
  const value = Array.isArray(raw) ? raw[0] : raw;
  if (!value) return DEFAULT_DESTINATION;

  if (value.startsWith('/') && !value.startsWith('//') && !value.startsWith('/\\')) return value;

  try {
    const url = new URL(value);
    if (url.protocol !== 'http:' && url.protocol !== 'https:') return DEFAULT_DESTINATION;
    return `${url.pathname}${url.search}${url.hash}`;
  } catch {
    return DEFAULT_DESTINATION;
  }
}
