/** A failed request to our own API, carrying the server's error code so callers can branch on it. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly field: string | undefined;

  constructor(options: { status: number; code: string; message: string; field?: string }) {
    super(options.message);
    this.name = 'ApiError';
    this.status = options.status;
    this.code = options.code;
    this.field = options.field;
  }

  /** 4xx answers will not change on a retry; 5xx and network failures might. */
  get isClientError(): boolean {
    return this.status >= 400 && this.status < 500;
  }
}
