/**
 * Headers for handing a stored log back: always a download of opaque bytes. Whatever the file
 * holds, a browser neither renders it (sandbox, nosniff) nor runs it.
 */
export function downloadHeaders(fileName: string, sizeBytes: number): Record<string, string> {
  // RFC 6266 / RFC 8187: the UTF-8 name percent-encoded, with a plain-ASCII fallback for old clients.
  const encoded = encodeURIComponent(fileName).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
  const fallback = fileName.replace(/[^\x20-\x7e]|["\\]/g, '_');
  return {
    'content-type': 'application/octet-stream',
    'content-disposition': `attachment; filename="${fallback}"; filename*=UTF-8''${encoded}`,
    'content-length': String(sizeBytes),
    'x-content-type-options': 'nosniff',
    'content-security-policy': 'sandbox',
    'cache-control': 'private, no-store',
  };
}
