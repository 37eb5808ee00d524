// validate({body, params, query}) parses each part with its zod schema before the handler runs; a failure goes
// to the error middleware as a ZodError (→ 400 validation_failed with the field paths).
import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { AppError } from './errors';

export interface RequestSchemas {
  body?: z.ZodType;
  params?: z.ZodType;
  query?: z.ZodType;
}

export function validate(schemas: RequestSchemas): RequestHandler {
  return (req, _res, next) => {
    if (schemas.body) {
      if (req.body === undefined) {
        throw new AppError('validation_failed', 'invalid', 'send a JSON body with Content-Type: application/json', {
          issues: [{ path: '', message: 'body is required' }],
        });
      }
      req.body = schemas.body.parse(req.body);
    }
    if (schemas.params) req.params = schemas.params.parse(req.params) as typeof req.params;
    // Express 5 exposes req.query through a getter; shadow it with the parsed value.
    if (schemas.query) Object.defineProperty(req, 'query', { value: schemas.query.parse(req.query), writable: true, configurable: true });
    next();
  };
}
