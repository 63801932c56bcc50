import type { ZodError } from 'zod';
import type { FieldIssue } from '@/api/client';

/** First message per top-level field, ready for a form item's feedback. */
export type FieldErrors = Record<string, string>;

/**
 * Field messages from a failed zod parse (client-side check) or from server details, first message winning.
 * @example fieldErrors([{ path: 'email', message: 'must be a valid e-mail address' }]) // { email: '…' }
 */
export function fieldErrors(source: ZodError | readonly FieldIssue[]): FieldErrors {
  const issues: FieldIssue[] = Array.isArray(source)
    ? [...source]
    : (source as ZodError).issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));
  const result: FieldErrors = {};
  for (const issue of issues) {
    const field = issue.path.split('.')[0] ?? '';
    if (field && !(field in result)) result[field] = issue.message;
  }
  return result;
}
