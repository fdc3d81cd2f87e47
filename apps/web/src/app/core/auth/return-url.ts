/** Where to go after signing in: only a path inside this app, never another site or the sign-in page itself. */
export function safeReturnUrl(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  if (next.startsWith('/account/sign-in') || next.startsWith('/account/sign-up')) return '/';
  return next;
}
