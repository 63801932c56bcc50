import type { z } from 'zod';
import { badRequest } from './httpError';

/**
 * Parses request input with a zod schema; a failure becomes a 400 naming every bad field.
 * @example const body = parse(signInBody, req.body);
 */
export function parse<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const details = result.error.issues.map((i) => ({ path: i.path.join('.') || '(body)', message: i.message }));
  const summary = details.map((d) => `${d.path}: ${d.message}`).join('; ');
  throw badRequest('validation_failed', `Some fields are not valid: ${summary}`, details);
}
