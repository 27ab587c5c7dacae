import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { MulterError } from 'multer';
import { AppError } from './AppError';

/** Unknown /api routes answer JSON, not the SPA page. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `no route ${req.method} ${req.originalUrl.split('?')[0]}`));
};

/**
 * The one error middleware: `{ error: { code, message, details } }`. Known errors pass their
 * message; anything else becomes a bare 500 so no stack trace or internal text reaches a client.
 */
export function errorMiddleware(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const e = toAppError(err);
    if (e.status >= 500) logger.error({ err, method: req.method, url: req.originalUrl }, 'request failed');
    else logger.debug({ code: e.code, url: req.originalUrl }, e.message);
    if (res.headersSent) return;
    res.status(e.status).json({ error: { code: e.code, message: e.message, ...(e.details === undefined ? {} : { details: e.details }) } });
  };
}

function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return new AppError(413, 'file_too_large', `file: larger than the upload limit`, { issues: [{ field: err.field ?? 'file', message: 'file is larger than the upload limit' }] });
    return new AppError(400, 'invalid_upload', `${err.field ?? 'file'}: ${err.message}`, { issues: [{ field: err.field ?? 'file', message: err.message }] });
  }
  const anyErr = err as { type?: string; status?: number; statusCode?: number; message?: string };
  // body-parser errors carry a status and a type; their messages are safe to show.
  if (anyErr && typeof anyErr.type === 'string' && typeof anyErr.status === 'number' && anyErr.status < 500) {
    if (anyErr.type === 'entity.parse.failed') return new AppError(400, 'invalid_json', 'body: not valid JSON', { issues: [{ field: '(body)', message: 'not valid JSON' }] });
    if (anyErr.type === 'entity.too.large') return new AppError(413, 'body_too_large', 'body: larger than the request limit', { issues: [{ field: '(body)', message: 'larger than the request limit' }] });
    return new AppError(anyErr.status, 'invalid_request', `body: ${anyErr.message ?? 'unreadable'}`, { issues: [{ field: '(body)', message: anyErr.message ?? 'unreadable' }] });
  }
  if (anyErr && typeof anyErr.status === 'number' && anyErr.status === 400) {
    return new AppError(400, 'invalid_request', 'request: malformed', { issues: [{ field: '(request)', message: 'malformed' }] });
  }
  return new AppError(500, 'internal', 'something went wrong on the server; the problem was logged');
}
