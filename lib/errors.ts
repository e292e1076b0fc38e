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
  too_large: 413,
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
  /** Every problem found when the message can name only the first (a rules text's errors by line and column). */
  readonly errors?: ReadonlyArray<ErrorDetail>;

  constructor(type: ErrorType, surface: string, message: string, field?: string, errors?: ReadonlyArray<ErrorDetail>) {
    super(message);
    this.name = 'AppError';
    this.type = type;
    this.surface = surface;
    this.field = field;
    this.errors = errors;
  }

  get code(): string {
    return `${this.type}:${this.surface}`;
  }

  get status(): number {
    return ERROR_STATUS[this.type];
  }
}

/** A problem at a place in a text: a rules text's line and column, or a field log's row and column name. */
export type ErrorDetail = { line: number; column: number; message: string } | { row: number; column: string | null; message: string };

export interface ErrorBody {
  error: { code: string; message: string; field?: string; errors?: ReadonlyArray<ErrorDetail> };
}

export function errorBody(error: AppError): ErrorBody {
  return { error: { code: error.code, message: error.message, ...(error.field ? { field: error.field } : {}), ...(error.errors ? { errors: error.errors } : {}) } };
}
