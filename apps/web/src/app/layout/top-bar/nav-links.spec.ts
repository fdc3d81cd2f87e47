import { describe, expect, it } from 'vitest';
import { navLinksFor } from './nav-links';

describe('navLinksFor', () => {
  it('shows People only to admins and Mailbox only in local mail mode', () => {
    expect(navLinksFor({ isAdmin: false, localMail: false }).map((l) => l.label)).toEqual(['Home', 'Explore']);
    expect(navLinksFor({ isAdmin: true, localMail: true }).map((l) => l.label)).toEqual(['Home', 'Explore', 'Moderation', 'People', 'Mailbox']);
  });

  it('shows Explore to everyone, visitors too', () => {
    expect(navLinksFor({ isAdmin: false, localMail: false, signedIn: false }).map((l) => l.path)).toContain('/explore');
  });

  it('shows Moderation to moderators and admins', () => {
    expect(navLinksFor({ isAdmin: false, isModerator: true, localMail: false, signedIn: true }).map((l) => l.label)).toEqual(['Home', 'Explore', 'Boards', 'Rack', 'Moderation']);
    expect(navLinksFor({ isAdmin: true, localMail: false, signedIn: true, openReports: 3 }).find((l) => l.label === 'Moderation')?.badge).toBe(3);
  });

  it('shows Boards and the rack to signed-in members only', () => {
    expect(navLinksFor({ isAdmin: false, localMail: false, signedIn: true }).map((l) => l.label)).toEqual(['Home', 'Explore', 'Boards', 'Rack']);
  });
});
