/** One destination in the top bar. */
export interface NavLink {
  label: string;
  path: string;
  icon: string;
  testId: string;
  /** A count to show beside the label (open reports on Moderation); none when 0 or absent. */
  badge?: number;
}

/** Which destinations a visitor sees: Explore for everyone, Boards and the rosette rack once signed in, Moderation for moderators and admins, People only for admins, Mailbox only in local mail mode. */
export function navLinksFor(options: { isAdmin: boolean; localMail: boolean; signedIn?: boolean; isModerator?: boolean; openReports?: number | null }): NavLink[] {
  const links: NavLink[] = [
    { label: 'Home', path: '/', icon: 'home', testId: 'nav-home' },
    { label: 'Explore', path: '/explore', icon: 'travel_explore', testId: 'nav-explore' },
  ];
  if (options.signedIn) links.push({ label: 'Boards', path: '/boards', icon: 'dashboard', testId: 'nav-boards' }, { label: 'Rack', path: '/rack', icon: 'settings_suggest', testId: 'nav-rack' });
  if (options.isModerator || options.isAdmin) links.push({ label: 'Moderation', path: '/moderation', icon: 'gavel', testId: 'nav-moderation', badge: options.openReports ?? undefined });
  if (options.isAdmin) links.push({ label: 'People', path: '/admin/people', icon: 'group', testId: 'nav-people' });
  if (options.localMail) links.push({ label: 'Mailbox', path: '/mailbox', icon: 'mail', testId: 'nav-mailbox' });
  return links;
}
