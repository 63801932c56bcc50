import { describe, expect, it } from 'vitest';
import { inviteBody } from '@shared/schemas/auth';
import { fieldErrors } from './formErrors';

// The zod issues come from the shared contract schemas, parsed by zod itself.
describe('fieldErrors', () => {
  it('maps a failed contract parse to one message per field', () => {
    const parsed = inviteBody.safeParse({ email: 'not-an-address', name: '  ', role: 'owner' });
    expect(parsed.success).toBe(false);
    const errors = fieldErrors(parsed.error!);
    expect(errors.email).toBe('must be a valid e-mail address');
    expect(errors.name).toBe('is required');
    expect(Object.keys(errors).sort()).toEqual(['email', 'name', 'role']);
  });

  it('keeps the first message of server details and ignores path-less ones', () => {
    expect(
      fieldErrors([
        { path: 'password', message: 'must be at least 10 characters' },
        { path: 'password', message: 'second message' },
        { path: '', message: 'general' },
      ]),
    ).toEqual({ password: 'must be at least 10 characters' });
  });
});
