// The API's one error type. Anything a client sent wrong becomes an AppError
// with a contract status; everything else is normalised to a 500 or a 503.
export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }

  static badRequest(code: string, message: string, fields?: Record<string, string>): AppError {
    return new AppError(code, message, 400, fields);
  }
  static unauthorized(message = 'Sign in first.'): AppError {
    return new AppError('not_signed_in', message, 401);
  }
  static forbidden(message = 'Your role may not do this.'): AppError {
    return new AppError('forbidden', message, 403);
  }
  static notFound(what: string): AppError {
    return new AppError('not_found', `${what} was not found.`, 404);
  }
  static conflict(code: string, message: string): AppError {
    return new AppError(code, message, 409);
  }
}
