import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ApiErrorBody } from '../../shared/errors';

/** The one error type the services throw; the middleware turns it into JSON. */
export class AppError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public fieldErrors?: Record<string, string[]>,
  ) {
    super(message);
  }
}

export const notFound = (what = 'That item') => new AppError(404, 'not_found', `${what} was not found.`);

/** Turns a ZodError into { field: [messages] } with dotted paths ("widthsIn.2"). */
export function zodFieldErrors(error: ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_form';
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export const validationError = (fieldErrors: Record<string, string[]>, message = 'Some values need fixing.') =>
  new AppError(400, 'validation', message, fieldErrors);

const body = (code: string, message: string, fieldErrors?: Record<string, string[]>): ApiErrorBody => ({
  error: fieldErrors ? { code, message, fieldErrors } : { code, message },
});

export const apiNotFound: RequestHandler = (_req, res) => {
  res.status(404).json(body('not_found', 'No such API route.'));
};

/** Decided once: validation failures are 400, conflicts 409, anything unexpected 500 with a log line. */
export const errorMiddleware: ErrorRequestHandler = (err, req, res, _next) => {
  if (res.headersSent) return;
  if (err instanceof ZodError) {
    res.status(400).json(body('validation', 'Some values need fixing.', zodFieldErrors(err)));
    return;
  }
  if (err instanceof AppError) {
    res.status(err.status).json(body(err.code, err.message, err.fieldErrors));
    return;
  }
  if (err && typeof err === 'object' && 'code' in err && err.code === 'wood_math') {
    const field = 'field' in err && typeof err.field === 'string' ? err.field : '_form';
    const message = (err as Error).message;
    res.status(400).json(body('validation', message, { [field]: [message] }));
    return;
  }
  // body-parser and multer errors carry a status or a known code
  const status = typeof err?.status === 'number' ? err.status : typeof err?.statusCode === 'number' ? err.statusCode : 500;
  if (status >= 400 && status < 500) {
    const message = err.type === 'entity.parse.failed' ? 'The request body is not valid JSON.' : err.type === 'entity.too.large' ? 'The request body is too large.' : 'The request could not be processed.';
    res.status(status).json(body('bad_request', message));
    return;
  }
  // The request log line carries it (with the request id), once.
  (res as typeof res & { err?: unknown }).err = err;
  res.status(500).json(body('internal', 'Something went wrong on our side. Please try again.'));
};
