import type { NextFunction, Request, Response } from 'express';
import { HttpError } from '../lib/http-error';

type BodyParserError = Error & { type?: string; status?: number; limit?: number };

function toHttpError(err: unknown): HttpError {
  if (err instanceof HttpError) return err;
  const e = err as BodyParserError & { code?: string; field?: string };
  if (e?.type === 'entity.too.large') {
    return new HttpError(413, 'request.too_large', `This request is too large (the limit is ${Math.round((e.limit ?? 0) / 1024)} KB).`);
  }
  if (e?.type === 'entity.parse.failed') return new HttpError(400, 'request.bad_json', 'The request body is not valid JSON.');
  if (e?.code === 'LIMIT_FILE_SIZE') return new HttpError(413, 'upload.too_large', 'This file is larger than the upload limit.');
  if (e?.code === 'LIMIT_UNEXPECTED_FILE') return new HttpError(400, 'upload.unexpected_field', `Send the file in the form field "file" (got "${e.field}").`);
  if (typeof e?.code === 'string' && e.code.startsWith('LIMIT_')) return new HttpError(400, 'upload.bad_form', e.message);
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500) {
    return new HttpError(e.status, 'request.invalid', e.message);
  }
  return new HttpError(500, 'server.error', 'Something went wrong on our side; nothing was changed. Please try again.');
}

export function errorHandler(err: unknown, req: Request, res: Response, _next: NextFunction) {
  const httpError = toHttpError(err);
  if (httpError.status >= 500) console.error(`[error] ${req.method} ${req.originalUrl}`, err);
  if (res.headersSent) return;
  res.status(httpError.status).json({
    error: { code: httpError.code, message: httpError.message, ...(httpError.fields ? { fields: httpError.fields } : {}) },
  });
}

export function notFoundHandler(req: Request, _res: Response, next: NextFunction) {
  next(new HttpError(404, 'not_found', `There is no API route ${req.method} ${req.path}.`));
}
