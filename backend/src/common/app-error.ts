/** A failure a person can act on: HTTP status, a stable code and a plain sentence. Thrown by services. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown[],
  ) {
    super(message);
  }
}

export const notFound = (what: string): AppError => new AppError(404, 'NOT_FOUND', `${what} was not found.`);
export const forbidden = (message = 'Your role does not allow this action.'): AppError => new AppError(403, 'FORBIDDEN', message);
export const conflict = (code: string, message: string, details?: unknown[]): AppError => new AppError(409, code, message, details);
export const badRequest = (code: string, message: string, details?: unknown[]): AppError => new AppError(400, code, message, details);
