import { FormControl, FormGroup } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { ApiError } from '../../core/http/api-error';
import { formProblem } from './form-problem';
import { applyServerFieldErrors } from './server-field-errors';

const form = () => new FormGroup({ email: new FormControl(''), profile: new FormGroup({ name: new FormControl('') }) });

describe('applyServerFieldErrors', () => {
  it('puts messages on controls by dotted path and returns the ones no control took', () => {
    const f = form();
    const rest = applyServerFieldErrors(f, { email: 'is taken', 'profile.name': 'is required', token: 'is not a valid link' });
    expect(f.controls.email.errors).toEqual({ server: 'is taken' });
    expect(f.get('profile.name')?.errors).toEqual({ server: 'is required' });
    expect(f.controls.email.touched).toBe(true);
    expect(rest).toEqual(['token is not a valid link']);
  });

  it('is cleared by the next edit', () => {
    const f = form();
    applyServerFieldErrors(f, { email: 'is taken' });
    f.controls.email.setValue('other@example.test');
    expect(f.controls.email.errors).toBeNull();
  });
});

describe('formProblem', () => {
  it("uses the page's words for a code it expects", () => {
    const e = new ApiError(401, 'invalid_credentials', 'Wrong');
    expect(formProblem(e, form(), { invalid_credentials: 'Check both.' })).toBe('Check both.');
  });

  it('leaves field problems to the fields', () => {
    const f = form();
    expect(formProblem(new ApiError(400, 'invalid_input', 'Bad', { email: 'is taken' }), f)).toBeNull();
    expect(f.controls.email.errors).toEqual({ server: 'is taken' });
  });

  it('rethrows what the form cannot fix: server faults, no answer, bugs, an ended session', () => {
    for (const e of [new ApiError(500, 'server_error', 'x'), new ApiError(0, 'network', 'x'), new Error('bug'), new ApiError(401, 'unauthenticated', 'x')]) {
      expect(() => formProblem(e, form())).toThrow();
    }
  });

  it('says "wait" for rate limiting', () => {
    expect(formProblem(new ApiError(429, 'rate_limited', 'Too many'), form())).toMatch(/wait/i);
  });
});
