/** The one error shape of the API, and the middleware that writes it. */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import multer from 'multer';

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
    /** What the server's log gets for a 5xx; the client sees only the message. */
    cause?: unknown,
  ) {
    super(message, { cause });
  }
}

export const notFound = (what = 'Not found.') => new HttpError(404, 'not-found', what);
export const forbidden = () => new HttpError(403, 'forbidden', 'Your account may not do this.');
export const unauthenticated = () => new HttpError(401, 'unauthenticated', 'Sign in first.');

function fromMulter(error: multer.MulterError): HttpError {
  switch (error.code) {
    case 'LIMIT_FILE_SIZE':
      return new HttpError(413, 'too-large', 'Each file may be at most 1 MiB.');
    case 'LIMIT_FILE_COUNT':
    case 'LIMIT_PART_COUNT':
      return new HttpError(413, 'too-large', 'At most 50 files at a time.');
    default:
      return new HttpError(400, 'invalid-input', `Upload refused: ${error.message}.`, { field: error.field });
  }
}

/** Turns whatever was thrown into `{ error: { code, message, details } }`; internals never reach the client. */
export const errorHandler =
  (log: (error: unknown) => void): ErrorRequestHandler =>
  (error: unknown, _req, res, _next) => {
    let http: HttpError;
    if (error instanceof HttpError) {
      http = error;
      if (http.status >= 500 && http.cause !== undefined) log(http.cause);
    } else if (error instanceof multer.MulterError) http = fromMulter(error);
    else if ((error as { type?: string }).type === 'entity.too.large')
      http = new HttpError(413, 'too-large', 'The request body is too large.');
    else if ((error as { type?: string }).type === 'entity.parse.failed')
      http = new HttpError(400, 'invalid-input', 'The body is not valid JSON.');
    else {
      log(error);
      http = new HttpError(500, 'internal', 'Something went wrong on the server.');
    }
    res.status(http.status).json({ error: { code: http.code, message: http.message, details: http.details ?? null } });
  };

export const apiNotFound: RequestHandler = () => {
  throw notFound('No such API route.');
};
