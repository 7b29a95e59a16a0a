import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ErrorBody } from '@vatside/contracts/errors';
import { HttpError } from './errors.ts';

/** Unknown API routes get the error shape instead of Express's HTML page. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'NOT_FOUND', `No API route ${req.method} ${req.path}.`));
};

interface BodyParserError {
  type?: string;
  status?: number;
}

function toHttpError(err: unknown): HttpError {
  if (err instanceof HttpError) return err;
  const type = (err as BodyParserError | null)?.type;
  if (type === 'entity.parse.failed')
    return new HttpError(400, 'BAD_JSON', 'The request body is not valid JSON.');
  if (type === 'entity.too.large')
    return new HttpError(413, 'PAYLOAD_TOO_LARGE', 'The request body is too large.');
  if (type === 'charset.unsupported' || type === 'encoding.unsupported') {
    return new HttpError(
      415,
      'UNSUPPORTED_MEDIA_TYPE',
      'The request body encoding is not supported.',
    );
  }
  return new HttpError(
    500,
    'INTERNAL',
    'Something went wrong on our side. Nothing was saved; please try again.',
  );
}

export const errorMiddleware: ErrorRequestHandler = (err, req, res, _next) => {
  const httpError = toHttpError(err);
  if (httpError.status >= 500) req.log.error({ err }, 'request failed');
  const body: ErrorBody = { error: { code: httpError.code, message: httpError.message } };
  if (httpError.fields) body.error.fields = httpError.fields;
  if (httpError.headers) res.set(httpError.headers);
  res.status(httpError.status).json(body);
};
