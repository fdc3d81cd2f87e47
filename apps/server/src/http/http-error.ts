/** An error a route throws on purpose; the error middleware turns it into the API's error shape. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export const notFound = (what = 'resource') => new HttpError(404, 'not_found', `${what} not found`);
export const unauthenticated = () => new HttpError(401, 'unauthenticated', 'Sign in first.');
export const forbidden = (message = 'You are not allowed to do that.') => new HttpError(403, 'forbidden', message);
