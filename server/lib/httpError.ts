/** A failure with an HTTP status and a stable code; the error middleware turns it into `{ error }`. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const badRequest = (code: string, message: string, details?: unknown) => new HttpError(400, code, message, details);
export const unauthenticated = (message = 'Sign in to continue.') => new HttpError(401, 'unauthenticated', message);
/** Deliberately vague: a non-member learns nothing about the team or the resource. */
export const forbidden = () => new HttpError(403, 'forbidden', 'You do not have access to this.');
export const notFound = (what: string) => new HttpError(404, 'not_found', `${what} was not found.`);
export const conflict = (message: string, details?: unknown) => new HttpError(409, 'conflict', message, details);
