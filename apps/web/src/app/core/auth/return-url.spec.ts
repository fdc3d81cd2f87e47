import { describe, expect, it } from 'vitest';
import { safeReturnUrl } from './return-url';

describe('safeReturnUrl', () => {
  it('keeps a path inside the app', () => {
    expect(safeReturnUrl('/admin/people?page=2')).toBe('/admin/people?page=2');
  });

  it('refuses other sites, protocol-relative and backslash tricks', () => {
    for (const next of ['https://elsewhere.test/', '//elsewhere.test', '/\\elsewhere.test', 'javascript:alert(1)', '']) {
      expect(safeReturnUrl(next)).toBe('/');
    }
    expect(safeReturnUrl(undefined)).toBe('/');
  });

  it('does not send a signed-in member back to the sign-in or sign-up page', () => {
    expect(safeReturnUrl('/account/sign-in?next=/x')).toBe('/');
    expect(safeReturnUrl('/account/sign-up')).toBe('/');
  });
});
