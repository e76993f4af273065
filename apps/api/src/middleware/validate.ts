import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { AppError } from '../lib/app-error.js';

type Part = 'body' | 'query' | 'params';

/** Field errors as { "boxes.0.items.1.quantity": "Quantity must be a whole number" }. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '_';
    const message =
      issue.code === 'unrecognized_keys' ? `Not allowed: ${issue.keys.join(', ')}` : issue.message;
    const fullKey = issue.code === 'unrecognized_keys' ? [key === '_' ? '' : key, issue.keys[0]].filter(Boolean).join('.') : key;
    fields[fullKey] ??= message;
  }
  return fields;
}

export function invalid(error: z.ZodError): AppError {
  const fields = fieldErrors(error);
  const first = Object.entries(fields)[0];
  return new AppError('invalid', first ? `${first[0]}: ${first[1]}` : 'Invalid input', 400, { fields });
}

/**
 * Parses one part of the request with a zod schema and keeps the parsed value
 * on `res.locals.valid[part]` (Express 5 does not allow reassigning req.query).
 */
export function validate<S extends z.ZodType>(part: Part, schema: S): RequestHandler {
  return (req, res, next) => {
    const result = schema.safeParse(req[part] ?? {});
    if (!result.success) throw invalid(result.error);
    res.locals.valid = { ...(res.locals.valid ?? {}), [part]: result.data };
    next();
  };
}
