import { createHash, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';

/** base64url without padding (RFC 4648 §5), the encoding JWTs and PKCE use. */
export function base64url(input: Buffer | string): string {
  return Buffer.from(input).toString('base64url');
}

/** An opaque random value for codes and tokens. */
export function randomToken(bytes = 32): string {
  return randomBytes(bytes).toString('base64url');
}

/** PKCE code challenge for the S256 method: BASE64URL(SHA256(ASCII(code_verifier))). */
export function s256Challenge(verifier: string): string {
  return base64url(createHash('sha256').update(verifier, 'ascii').digest());
}

/** code_verifier and S256 challenge alphabet: unreserved characters, 43 to 128 of them. */
const PKCE_VALUE = /^[A-Za-z0-9\-._~]{43,128}$/;

export function isPkceValue(value: string): boolean {
  return PKCE_VALUE.test(value);
}

/** Compares two secrets without leaking where they differ. */
export function sameSecret(a: string, b: string): boolean {
  const ha = createHash('sha256').update(a).digest();
  const hb = createHash('sha256').update(b).digest();
  return timingSafeEqual(ha, hb);
}

/** HMAC-SHA256 signature of a JWS signing input, base64url encoded. */
export function hs256Signature(signingInput: string, key: Buffer | string): string {
  return base64url(createHmac('sha256', key).update(signingInput, 'ascii').digest());
}

/** A compact JWS with alg HS256 over the given claims. */
export function signJwtHs256(claims: Record<string, unknown>, key: string): string {
  const header = base64url(JSON.stringify({ alg: 'HS256', typ: 'JWT' }));
  const payload = base64url(JSON.stringify(claims));
  const signingInput = `${header}.${payload}`;
  return `${signingInput}.${hs256Signature(signingInput, key)}`;
}

/**
 * Client credentials from an HTTP Basic header: client id and secret are
 * form-urlencoded before being joined with a colon and base64 encoded.
 */
export function parseBasicCredentials(header: string | undefined): { id: string; secret: string } | null {
  const match = /^Basic\s+([A-Za-z0-9+/=]+)\s*$/i.exec(header ?? '');
  if (!match?.[1]) return null;
  const decoded = Buffer.from(match[1], 'base64').toString('utf8');
  const colon = decoded.indexOf(':');
  if (colon < 0) return null;
  const formDecode = (s: string) => decodeURIComponent(s.replace(/\+/g, ' '));
  try {
    return { id: formDecode(decoded.slice(0, colon)), secret: formDecode(decoded.slice(colon + 1)) };
  } catch {
    return null;
  }
}
