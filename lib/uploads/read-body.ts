import 'server-only';
import { AppError } from '@/lib/errors';

function tooLarge(limitBytes: number): AppError {
  return new AppError('too_large', 'log', `A log may be at most ${Math.round(limitBytes / 1024)} KiB; trim it to the stretch around the fault`, 'body');
}

/**
 * The request body's bytes, read chunk by chunk and refused as soon as they pass `limitBytes`,
 * so an oversized upload is never held whole in memory. A declared length over the limit is
 * refused before reading anything.
 */
export async function readLimitedBody(request: Request, limitBytes: number): Promise<Uint8Array> {
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > limitBytes) throw tooLarge(limitBytes);
  if (!request.body) return new Uint8Array();
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limitBytes) {
      await reader.cancel();
      throw tooLarge(limitBytes);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}
