import { describe, expect, it } from 'vitest';
import { downloadHeaders } from '@/lib/uploads/download-headers';

describe('download headers of a stored log', () => {
  it('always sends opaque bytes as an attachment that a browser neither sniffs nor renders', () => {
    const headers = downloadHeaders('log.csv', 42);
    expect(headers).toMatchObject({
      'content-type': 'application/octet-stream',
      'x-content-type-options': 'nosniff',
      'content-security-policy': 'sandbox',
      'content-length': '42',
    });
    expect(headers['content-disposition']).toBe(`attachment; filename="log.csv"; filename*=UTF-8''log.csv`);
  });

  it('percent-encodes a UTF-8 name (RFC 8187) and gives old clients an ASCII name with no quote or backslash to break out of', () => {
    const disposition = downloadHeaders('Presse "LP-2"\\Größe (1).csv', 1)['content-disposition']!;
    expect(disposition).toContain(`filename*=UTF-8''Presse%20%22LP-2%22%5CGr%C3%B6%C3%9Fe%20%281%29.csv`);
    expect(disposition).toContain('filename="Presse _LP-2__Gr__e (1).csv"');
    // Decoding the extended value gives the name back exactly.
    expect(decodeURIComponent(disposition.split("UTF-8''")[1]!)).toBe('Presse "LP-2"\\Größe (1).csv');
  });
});
