// @ts-nocheck
import { SignJWT, errors, jwtVerify } from 'jose';
import { hashToken, randomToken } from './session';

const audience = 'tramontane:invite';

/**
 * An invitation link's token: a JWT signed with the installation's secret (HS256) carrying the invite's
 * row id and a random token id, expiring with the invite. The row keeps only the token id's hash and is
 * marked accepted on use, which makes the link single-use.
 */
export async function signInviteToken(secret: Uint8Array, inviteId: number, expiresAt: Date): Promise<{ token: string; tokenIdHash: string }> {
  const tokenId = randomToken(18);
  const token = await new SignJWT({ inv: inviteId })
    .setProtectedHeader({ alg: 'HS256' })
    .setJti(tokenId)
    .setAudience(audience)
    .setIssuedAt()
    .setExpirationTime(Math.floor(expiresAt.getTime() / 1000))
    .sign(secret);
  return { token, tokenIdHash: hashToken(tokenId) };
}

export type InviteTokenCheck = { ok: true; inviteId: number; tokenIdHash: string } | { ok: false; reason: 'expired' | 'invalid' };

export async function readInviteToken(secret: Uint8Array, token: string, now: Date): Promise<InviteTokenCheck> {
  try {
    const { payload } = await jwtVerify(token, secret, { audience, algorithms: ['HS256'], currentDate: now });
    if (typeof payload.inv !== 'number' || typeof payload.jti !== 'string') return { ok: false, reason: 'invalid' };
    return { ok: true, inviteId: payload.inv, tokenIdHash: hashToken(payload.jti) };
  } catch (error) {
    return { ok: false, reason: error instanceof errors.JWTExpired ? 'expired' : 'invalid' };
  }
}
