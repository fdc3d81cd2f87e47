import { describe, expect, it } from 'vitest';
import { messageLinks } from './message-links';

const ORIGIN = 'http://127.0.0.1:3000';

describe('messageLinks', () => {
  it('turns an account link into an in-app route, whatever host the mail names', () => {
    const text = 'Confirm: http://localhost:3000/account/verify?token=abc_DEF-123.\nThanks';
    expect(messageLinks(text, ORIGIN)).toEqual([
      { href: 'http://localhost:3000/account/verify?token=abc_DEF-123', route: { path: '/account/verify', query: { token: 'abc_DEF-123' } } },
    ]);
  });

  it('lists each link once, in order, and leaves other sites as plain links', () => {
    const text = 'See https://steel.example/data and https://steel.example/data, then http://127.0.0.1:3000/mailbox';
    const links = messageLinks(text, ORIGIN);
    expect(links.map((l) => l.href)).toEqual(['https://steel.example/data', 'http://127.0.0.1:3000/mailbox']);
    expect(links[0].route).toBeNull();
    expect(links[1].route).toEqual({ path: '/mailbox', query: {} });
  });

  it('finds nothing in plain prose', () => {
    expect(messageLinks('No links here.', ORIGIN)).toEqual([]);
  });
});
