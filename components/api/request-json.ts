import { ApiError } from './api-error';

type ErrorBody = { error?: { code?: unknown; message?: unknown; field?: unknown } };

function errorFromBody(status: number, body: unknown): ApiError {
  const detail = (body as ErrorBody | null)?.error;
  return new ApiError({
    status,
    code: typeof detail?.code === 'string' ? detail.code : `http:${status}`,
    message:
      typeof detail?.message === 'string'
        ? detail.message
        : `The server answered with status ${status}. Try again in a moment.`,
    field: typeof detail?.field === 'string' ? detail.field : undefined,
  });
}

async function fetchJson<T>(url: string, init: RequestInit, emptyAllowed: boolean): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url, init);
  } catch (cause) {
    if (init.signal?.aborted) throw cause;
    throw new ApiError({
      status: 0,
      code: 'network',
      message: 'Could not reach the server. Check the connection and try again.',
    });
  }

  const body: unknown = await response.json().catch(() => null);
  if (!response.ok) throw errorFromBody(response.status, body);
  if (body === null && !emptyAllowed) {
    throw new ApiError({
      status: response.status,
      code: 'invalid_response',
      message: 'The server sent a response that could not be read.',
    });
  }
  return body as T;
}

/**
 * GETs JSON from our API and throws an ApiError for anything but a 2xx answer.
 * The caller names the expected shape; the API contract, not a runtime check, guarantees it.
 */
export function requestJson<T>(url: string, signal?: AbortSignal): Promise<T> {
  return fetchJson<T>(url, { headers: { accept: 'application/json' }, signal }, false);
}

/**
 * Sends a change to our API with an optional JSON body; errors as for requestJson.
 * Some changes answer with no body, which resolves to null, so such callers name `T` as `unknown`.
 */
export function sendJson<T>(method: 'POST' | 'PUT' | 'PATCH' | 'DELETE', url: string, body?: unknown): Promise<T> {
  return fetchJson<T>(url, {
    method,
    headers:
      body === undefined
        ? { accept: 'application/json' }
        : { accept: 'application/json', 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  }, true);
}
