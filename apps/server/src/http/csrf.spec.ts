import { describe, expect, it } from 'vitest';
import { CsrfTokens } from './csrf';

describe('signed double-submit XSRF tokens', () => {
  const tokens = new CsrfTokens('a-session-secret-of-at-least-32-chars!');

  it('binds a signed-in session\'s token to its id, and a visitor\'s to nothing', () => {
    const token = tokens.forSession('sid-one');
    expect(tokens.valid(token, 'sid-one')).toBe(true);
    expect(tokens.valid(token, 'sid-two')).toBe(false);
    expect(tokens.valid(token, undefined)).toBe(false);
    const visitor = tokens.forVisitor();
    expect(tokens.valid(visitor, undefined)).toBe(true);
    expect(tokens.valid(visitor, 'sid-one')).toBe(false);
    expect(tokens.forVisitor()).not.toBe(visitor);
  });

  it('refuses tokens it did not sign: another secret, an altered nonce or mac, junk', () => {
    const other = new CsrfTokens('another-secret-another-secret-another');
    expect(tokens.valid(other.forVisitor(), undefined)).toBe(false);
    expect(tokens.valid(other.forSession('sid-one'), 'sid-one')).toBe(false);
    const [kind, nonce, mac] = tokens.forVisitor().split('.');
    expect(tokens.valid(`${kind}.${nonce}x.${mac}`, undefined)).toBe(false);
    expect(tokens.valid(`${kind}.${nonce}.${mac.slice(1)}A`, undefined)).toBe(false);
    for (const junk of ['', 'v', 'v..', 'v.abc', 's.', 'forged-token', 'v.a.b.c']) expect(tokens.valid(junk, undefined)).toBe(false);
  });
});
