// Errors are values with a stable code and a message for people; the error middleware maps
// them to HTTP. Throw these from services; never build error responses by hand.
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const badRequest = (code: string, message: string, fields?: Record<string, string>) =>
  new HttpError(400, code, message, fields);
export const unauthorised = (code = 'auth.required', message = 'Please sign in first.') =>
  new HttpError(401, code, message);
export const forbidden = (code: string, message: string) => new HttpError(403, code, message);
// Records of another studio answer exactly like records that do not exist.
export const notFound = (what = 'That item') =>
  new HttpError(404, 'not_found', `${what} was not found.`);
export const conflict = (code: string, message: string) => new HttpError(409, code, message);
