import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError } from '../lib/httpError';

export const notFoundApi: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No API route for ${req.method} ${req.originalUrl.split('?')[0]}.` } });
};

/** One place turns every failure into `{ error: { code, message, details } }`. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let status = 500;
  let body: { code: string; message: string; details?: unknown } = {
    code: 'internal',
    message: 'Something went wrong on the server; the error was logged.',
  };
  if (err instanceof HttpError) {
    status = err.status;
    body = { code: err.code, message: err.message, details: err.details };
  } else if (err?.type === 'entity.parse.failed') {
    status = 400;
    body = { code: 'invalid_json', message: 'The request body is not valid JSON.' };
  } else if (err?.type === 'entity.too.large') {
    status = 413;
    body = { code: 'payload_too_large', message: `The request body is larger than the limit (${err.limit} bytes).` };
  } else if (typeof err?.status === 'number' && err.status >= 400 && err.status < 500) {
    status = err.status;
    body = { code: 'bad_request', message: String(err.message ?? 'Bad request.') };
  }
  if (status >= 500) req.log?.error({ err }, 'request failed');
  if (body.details === undefined) delete body.details;
  res.status(status).json({ error: body });
};
