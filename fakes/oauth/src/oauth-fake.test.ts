import { createHmac } from 'node:crypto';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, startOAuthFake, subForEmail, type OAuthFake } from './index.js';

// RFC 7636, Appendix B: a verifier and its S256 challenge.
const VERIFIER = 'dBjftJeZ4CVP-mB92K27uhbUJU1p1r_wW1gFWFOEjXk';
const CHALLENGE = 'E9Melhoa2OwvFrEMTJguCHaoeK1t8URWbuGJSstw-cM';

const client = { clientId: 'shop-test', clientSecret: 'shop-test-secret', redirectUris: ['http://127.0.0.1:4999/auth/callback'] };
const REDIRECT = client.redirectUris[0]!;

let fake: OAuthFake;
let clock = 1_767_225_600_000;

beforeAll(async () => {
  fake = await startOAuthFake({ port: 0, clients: [client], now: () => clock });
});
afterAll(() => fake.close());
beforeEach(() => {
  clock = 1_767_225_600_000;
});

function authParams(overrides: Record<string, string | undefined> = {}): Record<string, string> {
  const base: Record<string, string | undefined> = {
    response_type: 'code',
    client_id: client.clientId,
    redirect_uri: REDIRECT,
    scope: 'openid email profile',
    state: 'st-8f2a',
    code_challenge: CHALLENGE,
    code_challenge_method: 'S256',
    ...overrides,
  };
  return Object.fromEntries(Object.entries(base).filter((e): e is [string, string] => e[1] !== undefined));
}

async function submitChooser(fields: Record<string, string>): Promise<Response> {
  return fetch(`${fake.url}/authorize`, { method: 'POST', body: new URLSearchParams(fields), redirect: 'manual' });
}

/** Signs in through the chooser form and returns the parameters sent back to the redirect URI. */
async function signIn(email: string, extra: Record<string, string> = {}, params = authParams()): Promise<URL> {
  const res = await submitChooser({ ...params, email, decision: 'allow', ...extra });
  expect(res.status).toBe(302);
  return new URL(res.headers.get('location')!);
}

async function redeem(code: string, overrides: Record<string, string | undefined> = {}, init: RequestInit = {}) {
  const fields = Object.entries({
    grant_type: 'authorization_code',
    code,
    redirect_uri: REDIRECT,
    code_verifier: VERIFIER,
    client_id: client.clientId,
    client_secret: client.clientSecret,
    ...overrides,
  }).filter((e): e is [string, string] => e[1] !== undefined);
  const res = await fetch(`${fake.url}/token`, { method: 'POST', body: new URLSearchParams(fields), ...init });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

async function codeFor(email: string, extra: Record<string, string> = {}): Promise<string> {
  return (await signIn(email, extra)).searchParams.get('code')!;
}

type Claims = Record<string, any>;

async function userinfoByQuery(token: string): Promise<Claims> {
  return (await fetch(`${fake.url}/userinfo?access_token=${encodeURIComponent(token)}`)).json() as Promise<Claims>;
}

function decodeJwt(jwt: string) {
  const [h, p, s] = jwt.split('.');
  return {
    header: JSON.parse(Buffer.from(h!, 'base64url').toString()),
    payload: JSON.parse(Buffer.from(p!, 'base64url').toString()),
    signingInput: `${h}.${p}`,
    signature: s!,
  };
}

describe('GET /authorize', () => {
  it('shows the chooser with the four demo accounts, the other-address form and Deny', async () => {
    const res = await fetch(`${fake.url}/authorize?${new URLSearchParams(authParams())}`);
    expect(res.status).toBe(200);
    const html = await res.text();
    for (const email of ['owner@fryline.test', 'baker@fryline.test', 'counter@fryline.test', 'customer@fryline.test']) {
      expect(html).toContain(`value="${email}"`);
    }
    expect(html).toMatch(/<input[^>]*name="email"[^>]*type="email"/);
    expect(html).toMatch(/name="email_verified" value="true" checked/);
    expect(html).toContain('value="deny"');
    expect(html).toContain('name="state" value="st-8f2a"');
    expect(html).not.toMatch(/(src|href)="https?:/);
  });

  // RFC 6749 §4.1.2.1 and §10.15: never redirect to an unverified redirect URI.
  it.each([
    ['unregistered redirect_uri', { redirect_uri: 'http://127.0.0.1:4999/elsewhere' }],
    ['redirect_uri differing by a trailing slash', { redirect_uri: `${REDIRECT}/` }],
    ['unknown client_id', { client_id: 'someone-else' }],
    ['missing code_challenge (RFC 7636 §4.4.1)', { code_challenge: undefined }],
    ['plain PKCE method', { code_challenge_method: 'plain' }],
    ['response_type token', { response_type: 'token' }],
  ])('refuses %s with a 400 page and no redirect', async (_label, overrides) => {
    const res = await fetch(`${fake.url}/authorize?${new URLSearchParams(authParams(overrides))}`, { redirect: 'manual' });
    expect(res.status).toBe(400);
    expect(res.headers.get('location')).toBeNull();
    expect(await res.text()).toContain("can't be used");
  });

  it('refuses a forged POST carrying an unregistered redirect_uri', async () => {
    const res = await submitChooser({ ...authParams({ redirect_uri: 'http://evil.test/cb' }), email: 'baker@fryline.test' });
    expect(res.status).toBe(400);
    expect(res.headers.get('location')).toBeNull();
  });
});

describe('POST /authorize', () => {
  it('redirects with code and the unchanged state on success (RFC 6749 §4.1.2)', async () => {
    const back = await signIn('owner@fryline.test');
    expect(`${back.origin}${back.pathname}`).toBe(REDIRECT);
    expect(back.searchParams.get('state')).toBe('st-8f2a');
    expect(back.searchParams.get('code')).toMatch(/^[A-Za-z0-9_-]{20,}$/);
  });

  it('Deny returns error=access_denied with the state (RFC 6749 §4.1.2.1)', async () => {
    const res = await submitChooser({ ...authParams(), decision: 'deny' });
    expect(res.status).toBe(302);
    const back = new URL(res.headers.get('location')!);
    expect(`${back.origin}${back.pathname}`).toBe(REDIRECT);
    expect(back.searchParams.get('error')).toBe('access_denied');
    expect(back.searchParams.get('state')).toBe('st-8f2a');
    expect(back.searchParams.has('code')).toBe(false);
  });

  it('re-shows the chooser for an address that is not one, without redirecting', async () => {
    const res = await submitChooser({ ...authParams(), email: 'not-an-address', decision: 'allow' });
    expect(res.status).toBe(400);
    expect(res.headers.get('location')).toBeNull();
    expect(await res.text()).toContain('is not an e-mail address');
  });
});

describe('POST /token', () => {
  it('exchanges a code with the right S256 verifier and returns a Bearer token and id_token', async () => {
    const code = await codeFor('baker@fryline.test');
    const { status, body } = await redeem(code);
    expect(status).toBe(200);
    expect(body).toMatchObject({ token_type: 'Bearer', expires_in: 3600, scope: 'openid email profile' });
    expect(typeof body.access_token).toBe('string');

    const jwt = decodeJwt(body.id_token as string);
    expect(jwt.header).toEqual({ alg: 'HS256', typ: 'JWT' });
    // RFC 7519 §4.1 registered claims; OpenID Connect Core §2 ID token claims
    const baker = DEMO_ACCOUNTS.find((a) => a.email === 'baker@fryline.test')!;
    expect(jwt.payload).toMatchObject({
      iss: fake.url,
      aud: client.clientId,
      sub: baker.sub,
      email: 'baker@fryline.test',
      email_verified: true,
      iat: Math.floor(clock / 1000),
      exp: Math.floor(clock / 1000) + 3600,
    });
    // HMAC-SHA256 keyed with the client secret (RFC 7518 §3.2)
    const expected = createHmac('sha256', client.clientSecret).update(jwt.signingInput).digest('base64url');
    expect(jwt.signature).toBe(expected);
  });

  it('accepts client credentials by HTTP Basic (RFC 6749 §2.3.1)', async () => {
    const code = await codeFor('counter@fryline.test');
    const basic = Buffer.from(`${client.clientId}:${client.clientSecret}`).toString('base64');
    const { status } = await redeem(code, { client_id: undefined, client_secret: undefined }, { headers: { Authorization: `Basic ${basic}` } });
    expect(status).toBe(200);
  });

  it('refuses a wrong code_verifier with invalid_grant (RFC 7636 §4.6)', async () => {
    const code = await codeFor('baker@fryline.test');
    const wrong = 'A'.repeat(43);
    expect(await redeem(code, { code_verifier: wrong })).toMatchObject({ status: 400, body: { error: 'invalid_grant' } });
  });

  it('refuses a missing code_verifier with invalid_grant', async () => {
    const code = await codeFor('baker@fryline.test');
    expect(await redeem(code, { code_verifier: undefined })).toMatchObject({ status: 400, body: { error: 'invalid_grant' } });
  });

  it('refuses a reused code and withdraws the token it bought (RFC 6749 §4.1.2)', async () => {
    const code = await codeFor('customer@fryline.test');
    const first = await redeem(code);
    expect(first.status).toBe(200);
    expect(await redeem(code)).toMatchObject({ status: 400, body: { error: 'invalid_grant' } });
    const info = await fetch(`${fake.url}/userinfo?access_token=${first.body.access_token as string}`);
    expect(info.status).toBe(401);
  });

  it('accepts a code 59 s old and refuses one 61 s old (our 60 s lifetime; RFC 6749 §4.1.2 caps it at 10 min)', async () => {
    const fresh = await codeFor('owner@fryline.test');
    const stale = await codeFor('owner@fryline.test');
    clock += 59_000;
    expect((await redeem(fresh)).status).toBe(200);
    clock += 2_000;
    expect(await redeem(stale)).toMatchObject({ status: 400, body: { error: 'invalid_grant' } });
  });

  it('refuses a redirect_uri that differs from the authorization request (RFC 6749 §4.1.3)', async () => {
    const code = await codeFor('owner@fryline.test');
    expect(await redeem(code, { redirect_uri: 'http://127.0.0.1:4999/other' })).toMatchObject({
      status: 400,
      body: { error: 'invalid_grant' },
    });
  });

  it('answers a wrong client secret with 401 invalid_client (RFC 6749 §5.2)', async () => {
    const code = await codeFor('owner@fryline.test');
    expect(await redeem(code, { client_secret: 'guess' })).toMatchObject({ status: 401, body: { error: 'invalid_client' } });
    // the failed attempt did not spend the code
    expect((await redeem(code)).status).toBe(200);
  });

  it('answers a request without any client credentials with 401 invalid_client (RFC 6749 §5.2)', async () => {
    const res = await fetch(`${fake.url}/token`, { method: 'POST' });
    expect(res.status).toBe(401);
    expect(await res.json()).toMatchObject({ error: 'invalid_client' });
  });

  it('refuses an unknown code', async () => {
    expect(await redeem('no-such-code')).toMatchObject({ status: 400, body: { error: 'invalid_grant' } });
  });
});

describe('GET /userinfo', () => {
  async function tokenFor(email: string, extra: Record<string, string> = {}): Promise<string> {
    const { body } = await redeem(await codeFor(email, extra));
    return body.access_token as string;
  }

  it('answers the same claims for a query token and a Bearer header (RFC 6750 §2.1, §2.3)', async () => {
    const token = await tokenFor('counter@fryline.test');
    const byQuery = await fetch(`${fake.url}/userinfo?access_token=${encodeURIComponent(token)}`);
    const byHeader = await fetch(`${fake.url}/userinfo`, { headers: { Authorization: `Bearer ${token}` } });
    expect(byQuery.status).toBe(200);
    expect(byHeader.status).toBe(200);
    const a = (await byQuery.json()) as Claims;
    const counter = DEMO_ACCOUNTS.find((x) => x.email === 'counter@fryline.test')!;
    // OpenID Connect Core §5.1 standard claims
    expect(a).toEqual({
      sub: counter.sub,
      name: counter.name,
      given_name: counter.name.split(' ')[0],
      family_name: counter.name.split(' ')[1],
      picture: `${fake.url}/avatar/${counter.sub}.svg`,
      email: 'counter@fryline.test',
      email_verified: true,
    });
    expect(await byHeader.json()).toEqual(a);
    const avatar = await fetch(a.picture);
    expect(avatar.headers.get('content-type')).toMatch(/^image\/svg\+xml/);
  });

  it('answers an unknown or missing token with 401 (RFC 6750 §3.1)', async () => {
    const unknown = await fetch(`${fake.url}/userinfo`, { headers: { Authorization: 'Bearer not-a-token' } });
    expect(unknown.status).toBe(401);
    expect(unknown.headers.get('www-authenticate')).toContain('invalid_token');
    expect((await fetch(`${fake.url}/userinfo`)).status).toBe(401);
  });

  it('refuses a token past its lifetime', async () => {
    const token = await tokenFor('owner@fryline.test');
    clock += 3_601_000;
    expect((await fetch(`${fake.url}/userinfo?access_token=${token}`)).status).toBe(401);
  });

  it('keys a new address by a stable sub and carries name and verified flag', async () => {
    const first = await tokenFor('Dana.Okafor@Example.test', { name: 'Dana Okafor' });
    const again = await tokenFor('dana.okafor@example.test', { email_verified: 'false' });
    const a = await userinfoByQuery(first);
    const b = await userinfoByQuery(again);
    expect(a.sub).toBe(subForEmail('dana.okafor@example.test'));
    expect(a.sub).toMatch(/^\d{21}$/);
    expect(b.sub).toBe(a.sub);
    expect(a).toMatchObject({ email: 'dana.okafor@example.test', given_name: 'Dana', family_name: 'Okafor', email_verified: true });
    expect(b).toMatchObject({ name: 'Dana Okafor', email_verified: false });
    expect(subForEmail('someone.else@example.test')).not.toBe(a.sub);
  });

  it('treats the unticked checkbox (hidden "false" only) as unverified and the ticked one as verified', async () => {
    const unticked = await tokenFor('lee@example.test', { email_verified: 'false' });
    const info = await userinfoByQuery(unticked);
    expect(info.email_verified).toBe(false);
    const ticked = new URLSearchParams({ ...authParams(), email: 'lee@example.test', decision: 'allow' });
    ticked.append('email_verified', 'false');
    ticked.append('email_verified', 'true');
    const back = await fetch(`${fake.url}/authorize`, { method: 'POST', body: ticked, redirect: 'manual' });
    const { body } = await redeem(new URL(back.headers.get('location')!).searchParams.get('code')!);
    const info2 = await userinfoByQuery(body.access_token as string);
    expect(info2.email_verified).toBe(true);
  });
});

describe('startOAuthFake', () => {
  it('reports a taken port clearly', async () => {
    await expect(startOAuthFake({ port: fake.port, clients: [client] })).rejects.toThrow(
      new RegExp(`${fake.port}.*already in use`),
    );
  });
});
