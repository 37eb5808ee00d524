// The one error middleware: every failure answers {code, message, details}, with the status chosen here.
// Never a stack: unexpected errors are logged with their stack and answered as a plain 500.
import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';
import type { Logger } from 'pino';
import { AppError, STATUS_OF_KIND } from './errors';

interface BodyParserError extends Error {
  type?: string;
  status?: number;
  limit?: number;
}

export function zodIssues(err: ZodError): { path: string; message: string }[] {
  return err.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));
}

export function errorMiddleware(logger: Logger): ErrorRequestHandler {
  return (err: unknown, req, res, _next) => {
    if (res.headersSent) {
      req.socket.destroy();
      return;
    }
    const send = (status: number, code: string, message: string, details?: unknown) =>
      res.status(status).json(details === undefined ? { code, message } : { code, message, details });

    if (err instanceof AppError) return send(STATUS_OF_KIND[err.kind], err.code, err.message, err.details);
    if (err instanceof ZodError) {
      const issues = zodIssues(err);
      const first = issues[0];
      const message = first ? `${first.path ? `${first.path}: ` : ''}${first.message}` : 'the request is not valid';
      return send(400, 'validation_failed', message, { issues });
    }
    const bp = err as BodyParserError;
    switch (bp?.type) {
      case 'entity.parse.failed':
        return send(400, 'malformed_json', 'the request body is not valid JSON');
      case 'entity.too.large':
        return send(413, 'payload_too_large', `the request body is too large (limit ${bp.limit ?? '?'} bytes)`);
      case 'encoding.unsupported':
      case 'charset.unsupported':
        return send(415, 'unsupported_encoding', bp.message);
      case 'request.aborted':
        return send(400, 'request_aborted', 'the request was aborted');
      default:
        break;
    }
    if (typeof bp?.status === 'number' && bp.status >= 400 && bp.status < 500) {
      return send(bp.status, 'bad_request', 'the request could not be read');
    }
    logger.error({ err, method: req.method, url: req.originalUrl }, 'unhandled error');
    return send(500, 'internal_error', 'something went wrong on the server; it has been logged');
  };
}
