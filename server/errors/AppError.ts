/** The one error type routes throw. `details` reaches the client; `cause` only the log. */
export class AppError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details?: unknown;

  constructor(status: number, code: string, message: string, details?: unknown, cause?: unknown) {
    super(message, cause === undefined ? undefined : { cause });
    this.name = 'AppError';
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

/** One problem with a request, located by field path or by line of an uploaded file. */
export interface Issue {
  field?: string;
  line?: number;
  message: string;
}

export const badRequest = (message: string, issues?: Issue[]) =>
  new AppError(400, 'invalid_request', message, issues ? { issues } : undefined);
export const unauthorized = (message = 'sign in first: this route needs a valid access token') =>
  new AppError(401, 'unauthorized', message);
export const forbidden = (message: string) => new AppError(403, 'forbidden', message);
export const notFound = (message: string) => new AppError(404, 'not_found', message);
export const conflict = (message: string, details?: unknown) => new AppError(409, 'conflict', message, details);
