/**
 * One error vocabulary for the server. A code reads `type:surface`
 * (`forbidden:circuit`, `invalid:title`); the HTTP status follows from the type.
 */
export const ERROR_STATUS = {
  invalid: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  rate_limited: 429,
  unavailable: 503,
  internal: 500,
} as const;

export type ErrorType = keyof typeof ERROR_STATUS;

export class AppError extends Error {
  readonly type: ErrorType;
  readonly surface: string;
  /** The input field at fault, when there is one. */
  readonly field?: string;

  constructor(type: ErrorType, surface: string, message: string, field?: string) {
    super(message);
    this.name = 'AppError';
    this.type = type;
    this.surface = surface;
    this.field = field;
  }

  get code(): string {
    return `${this.type}:${this.surface}`;
  }

  get status(): number {
    return ERROR_STATUS[this.type];
  }
}

export interface ErrorBody {
  error: { code: string; message: string; field?: string };
}

export function errorBody(error: AppError): ErrorBody {
  return { error: { code: error.code, message: error.message, ...(error.field ? { field: error.field } : {}) } };
}
