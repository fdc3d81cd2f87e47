import { describe, expect, it } from 'vitest';
import { navLinksFor } from './nav-links';

describe('navLinksFor', () => {
  it('shows People only to admins and Mailbox only in local mail mode', () => {
    expect(navLinksFor({ isAdmin: false, localMail: false }).map((l) => l.label)).toEqual(['Home']);
    expect(navLinksFor({ isAdmin: true, localMail: true }).map((l) => l.label)).toEqual(['Home', 'People', 'Mailbox']);
  });

  it('shows Boards to signed-in members only', () => {
    expect(navLinksFor({ isAdmin: false, localMail: false, signedIn: true }).map((l) => l.label)).toEqual(['Home', 'Boards']);
  });
});
