/**
 * An error answered by the Sheaf server (`{error: {code, message}}`), or a failure to reach it.
 * `status` is the HTTP status (0 when the request never got an answer); `code` is the server's
 * machine-readable code (`invalid-field`, `not-signed-in`, `forbidden`, `csrf`, `not-found`,
 * `conflict`, `last-owner`, `expired`, `rate-limited`, ...). For `invalid-field` the server's
 * message reads `field: problem; other.field: problem`; `fieldErrors` holds those problems by
 * field path so a form can show each beside its input.
 */
/** One of several problems of a request: the field, and for a file its row and column. */
export interface ApiErrorDetail {
  field: string;
  row?: number;
  column?: string;
  message: string;
}

export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly code: string;
  readonly fieldErrors: Readonly<Record<string, string>>;
  /** Each problem when the server listed several (the bad rows of an uploaded CSV file). */
  readonly details: readonly ApiErrorDetail[];

  constructor(status: number, code: string, message: string, details: readonly ApiErrorDetail[] = []) {
    super(message);
    this.status = status;
    this.code = code;
    this.fieldErrors = code === 'invalid-field' ? parseFieldProblems(message) : {};
    this.details = details;
  }

  /** The first field the server named, if any. */
  get field(): string | undefined {
    return Object.keys(this.fieldErrors)[0];
  }

  get isUnauthorized(): boolean {
    return this.status === 401;
  }
}

// "email: must be an e-mail address; cells.2.id: must not be empty"
const FIELD_PROBLEM = /^([A-Za-z_][\w.-]*): (.+)$/s;

function parseFieldProblems(message: string): Record<string, string> {
  const problems: Record<string, string> = {};
  for (const part of message.split('; ')) {
    const match = FIELD_PROBLEM.exec(part.trim());
    if (match?.[1] && match[2] && !(match[1] in problems)) problems[match[1]] = match[2];
  }
  return problems;
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}

/** One line a person can act on, for any error a request can produce. */
export function describeError(error: unknown): string {
  if (isApiError(error)) {
    if (error.status === 0) return `The Sheaf server could not be reached: ${error.message}`;
    return error.message || `The server answered ${error.status} (${error.code}).`;
  }
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}
