/** Application errors: each carries an HTTP status and a stable code for `{ error: { code, message, details? } }`. */
export class AppError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly details?: unknown,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class BadRequestError extends AppError {
  constructor(message: string, details?: unknown) {
    super(400, 'bad_request', message, details);
  }
}
export class ValidationError extends AppError {
  constructor(message: string, details?: unknown) {
    super(400, 'invalid_input', message, details);
  }
}
export class UnauthenticatedError extends AppError {
  constructor(message = 'Sign in to continue.') {
    super(401, 'unauthenticated', message);
  }
}
export class ForbiddenError extends AppError {
  constructor(message = 'Your role does not allow this.') {
    super(403, 'forbidden', message);
  }
}
export class NotFoundError extends AppError {
  constructor(what = 'Resource') {
    super(404, 'not_found', `${what} not found.`);
  }
}
export class ConflictError extends AppError {
  constructor(message: string, details?: unknown) {
    super(409, 'conflict', message, details);
  }
}
export class PayloadTooLargeError extends AppError {
  constructor(message: string) {
    super(413, 'too_large', message);
  }
}
export class UnsupportedMediaTypeError extends AppError {
  constructor(message: string) {
    super(415, 'unsupported_media_type', message);
  }
}
export class UnprocessableError extends AppError {
  constructor(message: string, details?: unknown) {
    super(422, 'unprocessable', message, details);
  }
}
export class DatabaseUnavailableError extends AppError {
  constructor() {
    super(503, 'database_unavailable', 'The database is unavailable; try again shortly.');
  }
}
