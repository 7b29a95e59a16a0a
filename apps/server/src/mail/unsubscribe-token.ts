import { createHmac, timingSafeEqual } from 'node:crypto';

// One-click unsubscribe tokens: who and which studio, signed with HMAC-SHA256 under the server's
// secret, so the link works without signing in and cannot be forged for someone else. They do
// not expire: an unsubscribe link in an old e-mail must still work.

const PURPOSE = 'vatside.unsubscribe.v1';

export interface UnsubscribeClaim {
  studioId: string;
  userId: string;
}

const sign = (secret: string, payload: string) =>
  createHmac('sha256', secret).update(`${PURPOSE}.${payload}`).digest();

export function unsubscribeToken(secret: string, claim: UnsubscribeClaim): string {
  const payload = Buffer.from(JSON.stringify({ s: claim.studioId, u: claim.userId })).toString(
    'base64url',
  );
  return `${payload}.${sign(secret, payload).toString('base64url')}`;
}

/** The claim inside a token, or null when the signature or the shape is wrong. */
export function readUnsubscribeToken(secret: string, token: string): UnsubscribeClaim | null {
  const [payload = '', signature = ''] = token.split('.');
  const given = Buffer.from(signature, 'base64url');
  const expected = sign(secret, payload);
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return null;
  try {
    const parsed = JSON.parse(Buffer.from(payload, 'base64url').toString('utf8')) as unknown;
    const { s, u } = (parsed ?? {}) as { s?: unknown; u?: unknown };
    if (typeof s !== 'string' || typeof u !== 'string') return null;
    return { studioId: s, userId: u };
  } catch {
    return null;
  }
}
