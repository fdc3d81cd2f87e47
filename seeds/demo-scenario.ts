/**
 * The demo scenario: the Fenwick Marsh Turners' Guild, an invented club of ornamental turners.
 * Every name and address here is invented; the addresses use the reserved `example.test` domain.
 * This password exists only in demo data (and in the README, which says so).
 */
export const DEMO_CLUB = {
  name: "Fenwick Marsh Turners' Guild",
  motto: 'Every bar from our own rosettes.',
};

export const DEMO_PASSWORD = 'marsh-lathe-demo-2026';

export interface DemoAccount {
  email: string;
  displayName: string;
  role: 'member' | 'moderator' | 'admin';
  units: 'mm' | 'in';
  about: string;
}

export const DEMO_ACCOUNTS: DemoAccount[] = [
  { email: 'odile@example.test', displayName: 'Odile Farrant', role: 'admin', units: 'mm', about: 'Guild secretary; keeps the club lathe and the members list.' },
  { email: 'tobias@example.test', displayName: 'Tobias Greenhalgh', role: 'moderator', units: 'in', about: 'Curates the showcase; cuts his keepers in A2.' },
  { email: 'maren@example.test', displayName: 'Maren Ashdown', role: 'member', units: 'mm', about: 'Owns forty-odd rosettes and a soft spot for basket weave.' },
  { email: 'ibrahim@example.test', displayName: 'Ibrahim Coldwell', role: 'member', units: 'in', about: 'New to straight-line work; trials everything in acrylic first.' },
  { email: 'saskia@example.test', displayName: 'Saskia Penrose', role: 'member', units: 'mm', about: 'Engraves watch dials; likes fine line spacing and moiré.' },
];
