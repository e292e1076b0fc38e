import { describe, expect, it } from 'vitest';
import { readLimitedBody } from '@/lib/uploads/read-body';

/** A request whose body is `chunks` chunks of `size` bytes, counting how many were pulled. */
function streamedRequest(chunks: number, size: number, headers: Record<string, string> = {}) {
  const pulled = { count: 0, cancelled: false };
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (pulled.count === chunks) return controller.close();
      pulled.count += 1;
      controller.enqueue(new Uint8Array(size).fill(0x31));
    },
    cancel() {
      pulled.cancelled = true;
    },
  });
  return { request: new Request('http://localhost/upload', { method: 'POST', body, headers, duplex: 'half' } as RequestInit), pulled };
}

describe('reading an upload body with a limit', () => {
  it('gives the bytes of a body within the limit', async () => {
    const { request } = streamedRequest(3, 100);
    expect((await readLimitedBody(request, 300)).byteLength).toBe(300);
  });

  it('stops reading as soon as the body passes the limit, with too_large', async () => {
    const { request, pulled } = streamedRequest(1000, 100);
    await expect(readLimitedBody(request, 250)).rejects.toMatchObject({ code: 'too_large:log', status: 413 });
    expect(pulled.count).toBeLessThan(10);
    expect(pulled.cancelled).toBe(true);
  });

  it('refuses a declared length over the limit before reading anything', async () => {
    const { request, pulled } = streamedRequest(100, 10, { 'content-length': '1000' });
    await expect(readLimitedBody(request, 250)).rejects.toMatchObject({ code: 'too_large:log' });
    expect(pulled.count).toBeLessThanOrEqual(1);
  });
});
