import { createHmac, timingSafeEqual } from 'node:crypto';

/**
 * One-click unsubscribe links: the user id and an HMAC-SHA256 of it under the server's secret,
 * so a link works without signing in and cannot be made for someone else. It does not expire
 * (an old e-mail's link should still work); it can only turn e-mail off.
 */
const mac = (secret: string, userId: string) => createHmac('sha256', secret).update(`unsubscribe:${userId}`).digest('base64url');

export function unsubscribeToken(secret: string, userId: string): string {
  return `${Buffer.from(userId).toString('base64url')}.${mac(secret, userId)}`;
}

/** The user id a token was made for, or undefined when it is not genuine. */
export function verifyUnsubscribeToken(secret: string, token: string): string | undefined {
  const [id64, sig] = token.split('.');
  if (!id64 || !sig || token.length > 200) return undefined;
  const userId = Buffer.from(id64, 'base64url').toString();
  const expected = Buffer.from(mac(secret, userId));
  const given = Buffer.from(sig);
  return expected.length === given.length && timingSafeEqual(expected, given) ? userId : undefined;
}

/** The absolute link that goes in every notification e-mail. */
export const unsubscribeUrl = (publicUrl: string, secret: string, userId: string) =>
  `${publicUrl}/api/notifications/unsubscribe?token=${unsubscribeToken(secret, userId)}`;
