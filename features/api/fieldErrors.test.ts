import { signUpBodySchema } from '@/shared/schemas';

import { ApiError } from './ApiError';
import { serverFieldErrors, validateForm } from './fieldErrors';

describe('validateForm', () => {
  it('when the sign-up form is valid, then the normalised body', () => {
    const result = validateForm(signUpBodySchema, { name: 'Ana', email: ' Ana@Example.org ', password: 'long enough pw' });
    expect(result).toEqual({ ok: true, body: { name: 'Ana', email: 'ana@example.org', password: 'long enough pw' } });
  });

  it('when the password is short, then one sentence-cased message on that field', () => {
    const result = validateForm(signUpBodySchema, { name: 'Ana', email: 'ana@example.org', password: 'short' });
    expect(result).toEqual({ ok: false, errors: { password: 'Password must have at least 10 characters' } });
  });
});

describe('serverFieldErrors', () => {
  it('when the API reports issues, then messages keyed by the first path segment', () => {
    const error = new ApiError(400, 'invalid_input', 'Invalid body', {
      issues: [
        { path: 'email', message: 'e-mail must look like name@example.org' },
        { path: 'email', message: 'a second message is ignored' },
        { path: 'change.role', message: 'role must be one of owner, editor, viewer' },
      ],
    });
    expect(serverFieldErrors(error)).toEqual({
      email: 'E-mail must look like name@example.org',
      change: 'Role must be one of owner, editor, viewer',
    });
  });

  it('when the error is not a validation error, then no field messages', () => {
    expect(serverFieldErrors(new ApiError(429, 'rate_limited', 'Too many'))).toEqual({});
    expect(serverFieldErrors(new TypeError('fetch failed'))).toEqual({});
  });
});
