import crypto from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Request, RequestHandler } from 'express';
import { pinoHttp } from 'pino-http';
import type { Logger } from './logger';

export const REQUEST_ID_HEADER = 'X-Request-Id';

// Crockford's base32: no I, L, O or U, so an id read out over the phone is not misheard.
const ALPHABET = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';

/** A short id a buyer can quote: "7K3D-Q9XA-2MBF" (60 random bits). */
export function newRequestId(): string {
  const bytes = crypto.randomBytes(12);
  let id = '';
  for (let i = 0; i < 12; i++) id += ALPHABET[bytes[i] & 31];
  return `${id.slice(0, 4)}-${id.slice(4, 8)}-${id.slice(8)}`;
}

const MATCHED = Symbol('matched route');
type Matched = { [MATCHED]?: string };

/**
 * Remembers the full pattern of the route that handles the request ("/api/slabs/:id") at the
 * moment Express matches it: by the time the response ends, an error may have unwound the
 * routers and reset req.baseUrl.
 */
const rememberRoute: RequestHandler = (req, _res, next) => {
  let route: Request['route'];
  Object.defineProperty(req, 'route', {
    configurable: true,
    enumerable: true,
    get: () => route,
    set(value: Request['route']) {
      route = value;
      if (typeof value?.path === 'string') (req as Matched)[MATCHED] = `${req.baseUrl}${value.path}`.replace(/(.)\/$/, '$1');
    },
  });
  next();
};

const routeOf = (req: Request) => (req as Matched)[MATCHED];

/** The path without its query string, with opaque tokens (password-reset links) masked. */
export function loggablePath(url: string): string {
  const path = url.split('?')[0];
  return path.split('/').map((seg) => (/^[A-Za-z0-9_-]{20,}$/.test(seg) ? ':token' : seg)).join('/');
}

/**
 * One log line per request: id, method, route, path, status and duration (plus the client address).
 * The id also goes back in the X-Request-Id header; the client shows it on error pages.
 */
export function requestLog(logger: Logger): RequestHandler {
  const middleware = pinoHttp<IncomingMessage, ServerResponse>({
    logger,
    quietReqLogger: true,
    quietResLogger: true,
    genReqId: (_req, res) => {
      const id = newRequestId();
      res.setHeader(REQUEST_ID_HEADER, id);
      return id;
    },
    // Thrown errors are errors; a 5xx the app chose to send (not ready, payment service down) is a warning.
    customLogLevel: (_req, res, err) => (err || errorOf(res) ? 'error' : res.statusCode >= 500 ? 'warn' : 'info'),
    customSuccessMessage: () => 'request',
    customErrorMessage: () => 'request failed',
    customSuccessObject: (req, res, base: { responseTime?: number }) => fields(req as Request, res, base.responseTime),
    customErrorObject: (req, res, _err, base: { responseTime?: number }) => {
      // Only a real thrown error (handed over by the error middleware) is worth a stack.
      const err = errorOf(res);
      return { ...fields(req as Request, res, base.responseTime), ...(err ? { err } : {}) };
    },
  });
  const log = middleware as unknown as RequestHandler;
  return (req, res, next) => log(req, res, () => rememberRoute(req, res, next));
}

const errorOf = (res: ServerResponse) => (res as ServerResponse & { err?: unknown }).err;

function fields(req: Request, res: ServerResponse, ms: number | undefined) {
  return {
    method: req.method,
    route: routeOf(req),
    path: loggablePath(req.originalUrl ?? req.url ?? ''),
    status: res.writableFinished || res.headersSent ? res.statusCode : undefined,
    ms,
    ip: req.ip,
    ...(res.writableFinished ? {} : { aborted: true }),
  };
}
