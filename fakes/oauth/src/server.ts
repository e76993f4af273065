import { createServer, type Server } from 'node:http';
import express, { type Request, type Response } from 'express';
import { PeopleDirectory, normaliseEmail, splitName, type Person } from './accounts.js';
import { avatarSvg, chooserPage, errorPage } from './pages.js';
import {
  isPkceValue,
  parseBasicCredentials,
  randomToken,
  s256Challenge,
  sameSecret,
  signJwtHs256,
} from './protocol.js';

export interface OAuthClient {
  clientId: string;
  clientSecret: string;
  /** Exact redirect URIs; a request must name one of them character for character. */
  redirectUris: string[];
}

export interface OAuthFakeOptions {
  /** 0 or absent → a free port. */
  port?: number;
  /** Default 127.0.0.1. */
  host?: string;
  clients: OAuthClient[];
  /** Clock in milliseconds since the epoch; tests inject one to age codes and tokens. */
  now?: () => number;
}

export interface OAuthFake {
  /** Base URL, e.g. http://127.0.0.1:3101 (also the id_token issuer). */
  url: string;
  port: number;
  close(): Promise<void>;
}

/** Thrown by startOAuthFake when the port is taken. */
export class PortInUseError extends Error {
  readonly code = 'EADDRINUSE';
  constructor(
    readonly host: string,
    readonly port: number,
  ) {
    super(`the sign-in stand-in cannot listen on ${host}:${port}: the port is already in use`);
  }
}

export const CODE_LIFETIME_MS = 60_000;
export const ACCESS_TOKEN_LIFETIME_S = 3600;
const DEFAULT_SCOPE = 'openid email profile';

interface AuthRequest {
  clientId: string;
  redirectUri: string;
  scope: string;
  state: string | undefined;
  codeChallenge: string;
  nonce: string | undefined;
  loginHint: string | undefined;
}

interface CodeGrant {
  request: AuthRequest;
  person: Person;
  emailVerified: boolean;
  issuedAt: number;
  used: boolean;
  accessTokens: string[];
}

interface AccessGrant {
  clientId: string;
  sub: string;
  emailVerified: boolean;
  scope: string;
  expiresAt: number;
}

type Params = Record<string, unknown>;

/** One value of a parameter; a repeated parameter is an error, as OAuth forbids repeats. */
function single(params: Params, key: string): string | undefined | null {
  const value = params[key];
  if (value === undefined || value === '') return undefined;
  return typeof value === 'string' ? value : null;
}

/** The last value of a field (a checkbox after its hidden "false" twin). */
function lastValue(params: Params, key: string): string | undefined {
  const value = params[key];
  if (Array.isArray(value)) return value.length ? String(value[value.length - 1]) : undefined;
  return typeof value === 'string' ? value : undefined;
}

function validateClients(clients: OAuthClient[]): Map<string, OAuthClient> {
  const byId = new Map<string, OAuthClient>();
  for (const c of clients) {
    if (!c.clientId || !c.clientSecret) throw new Error('every client needs a clientId and a clientSecret');
    if (byId.has(c.clientId)) throw new Error(`client ${c.clientId} is registered twice`);
    for (const uri of c.redirectUris) {
      let parsed: URL;
      try {
        parsed = new URL(uri);
      } catch {
        throw new Error(`client ${c.clientId}: redirect URI ${JSON.stringify(uri)} is not an absolute URL`);
      }
      if (!/^https?:$/.test(parsed.protocol) || parsed.hash) {
        throw new Error(`client ${c.clientId}: redirect URI ${uri} must be http(s) without a fragment`);
      }
    }
    byId.set(c.clientId, { ...c, redirectUris: [...c.redirectUris] });
  }
  return byId;
}

export function createOAuthApp(opts: { clients: OAuthClient[]; now: () => number; issuer: () => string }) {
  const clients = validateClients(opts.clients);
  const { now } = opts;
  const people = new PeopleDirectory();
  const codes = new Map<string, CodeGrant>();
  const tokens = new Map<string, AccessGrant>();

  function readAuthRequest(params: Params): { request: AuthRequest } | { error: string } {
    const clientId = single(params, 'client_id');
    const redirectUri = single(params, 'redirect_uri');
    if (clientId === null || redirectUri === null) return { error: 'client_id and redirect_uri must appear once.' };
    const client = clientId ? clients.get(clientId) : undefined;
    if (!client) return { error: `Unknown client_id ${JSON.stringify(clientId ?? '')}.` };
    if (!redirectUri || !client.redirectUris.includes(redirectUri)) {
      return { error: `redirect_uri ${JSON.stringify(redirectUri ?? '')} is not registered for client ${clientId}.` };
    }
    const fields = ['response_type', 'scope', 'state', 'code_challenge', 'code_challenge_method', 'nonce', 'login_hint'];
    const v: Record<string, string | undefined> = {};
    for (const f of fields) {
      const value = single(params, f);
      if (value === null) return { error: `Parameter ${f} must appear once.` };
      v[f] = value;
    }
    if (v.response_type !== 'code') return { error: 'response_type must be "code".' };
    if (!v.code_challenge) return { error: 'code_challenge is required (PKCE).' };
    if (v.code_challenge_method !== 'S256') return { error: 'code_challenge_method must be "S256".' };
    if (!isPkceValue(v.code_challenge) || v.code_challenge.length !== 43) {
      return { error: 'code_challenge must be a base64url SHA-256 value of 43 characters.' };
    }
    return {
      request: {
        clientId: client.clientId,
        redirectUri,
        scope: v.scope ?? DEFAULT_SCOPE,
        state: v.state,
        codeChallenge: v.code_challenge,
        nonce: v.nonce,
        loginHint: v.login_hint,
      },
    };
  }

  /** The authorization request as the hidden fields of the chooser's forms. */
  function requestFields(r: AuthRequest): Record<string, string | undefined> {
    return {
      response_type: 'code',
      client_id: r.clientId,
      redirect_uri: r.redirectUri,
      scope: r.scope,
      state: r.state,
      code_challenge: r.codeChallenge,
      code_challenge_method: 'S256',
      nonce: r.nonce,
    };
  }

  function sendPage(res: Response, status: number, html: string) {
    res
      .status(status)
      .set({
        'Content-Type': 'text/html; charset=utf-8',
        'Cache-Control': 'no-store',
        'Content-Security-Policy': "default-src 'none'; style-src 'unsafe-inline'; img-src 'self' data:; frame-ancestors 'none'",
        'X-Frame-Options': 'DENY',
        'Referrer-Policy': 'no-referrer',
      })
      .send(html);
  }

  function redirectBack(res: Response, r: AuthRequest, params: Record<string, string>) {
    const target = new URL(r.redirectUri);
    for (const [k, v] of Object.entries(params)) target.searchParams.set(k, v);
    if (r.state !== undefined) target.searchParams.set('state', r.state);
    res.set('Cache-Control', 'no-store').redirect(302, target.toString());
  }

  function sweep() {
    const t = now();
    for (const [code, grant] of codes) if (t - grant.issuedAt > 10 * CODE_LIFETIME_MS) codes.delete(code);
    for (const [token, grant] of tokens) if (grant.expiresAt <= t) tokens.delete(token);
  }

  function tokenError(res: Response, status: number, error: string, description: string) {
    if (status === 401) res.set('WWW-Authenticate', 'Basic realm="fake-oauth"');
    res.status(status).set({ 'Cache-Control': 'no-store', Pragma: 'no-cache' }).json({ error, error_description: description });
  }

  function authenticateClient(req: Request, body: Params): OAuthClient | string {
    const basic = parseBasicCredentials(req.get('authorization'));
    const bodyId = single(body, 'client_id');
    const bodySecret = single(body, 'client_secret');
    if (basic && bodySecret) return 'use either HTTP Basic or client_secret in the body, not both';
    const id = basic?.id ?? bodyId;
    const secret = basic?.secret ?? bodySecret;
    if (basic && bodyId && bodyId !== basic.id) return 'client_id in the body differs from the Basic credentials';
    const client = id ? clients.get(id) : undefined;
    if (!client || !secret || !sameSecret(secret, client.clientSecret)) return 'unknown client or wrong client secret';
    return client;
  }

  function bearerToken(req: Request): string | undefined | null {
    const header = req.get('authorization');
    const fromHeader = header ? /^Bearer\s+(\S+)\s*$/i.exec(header)?.[1] ?? null : undefined;
    const fromQuery = single(req.query as Params, 'access_token');
    if (fromHeader === null || fromQuery === null || (fromHeader && fromQuery)) return null;
    return fromHeader ?? fromQuery;
  }

  function userInfo(person: Person, emailVerified: boolean) {
    return {
      sub: person.sub,
      name: person.name,
      ...splitName(person.name),
      picture: `${opts.issuer()}/avatar/${person.sub}.svg`,
      email: person.email,
      email_verified: emailVerified,
    };
  }

  const app = express();
  app.disable('x-powered-by');
  const form = express.urlencoded({ extended: false, limit: '32kb' });

  app.get('/authorize', (req, res) => {
    const read = readAuthRequest(req.query as Params);
    if ('error' in read) return sendPage(res, 400, errorPage(read.error));
    const r = read.request;
    sendPage(res, 200, chooserPage({ clientId: r.clientId, request: requestFields(r), loginHint: r.loginHint }));
  });

  app.post('/authorize', form, (req, res) => {
    const body = (req.body ?? {}) as Params;
    const read = readAuthRequest(body);
    if ('error' in read) return sendPage(res, 400, errorPage(read.error));
    const r = read.request;
    if (lastValue(body, 'decision') === 'deny') {
      return redirectBack(res, r, { error: 'access_denied', error_description: 'The user denied the request.' });
    }
    const rawEmail = lastValue(body, 'email') ?? '';
    const name = (lastValue(body, 'name') ?? '').trim().slice(0, 100) || undefined;
    const verifiedField = lastValue(body, 'email_verified');
    const emailVerified = verifiedField === undefined || ['true', 'on', '1', 'yes'].includes(verifiedField);
    const email = normaliseEmail(rawEmail);
    if (!email) {
      const error = rawEmail.trim() ? `"${rawEmail.trim()}" is not an e-mail address.` : 'Enter an e-mail address.';
      const page = chooserPage({ clientId: r.clientId, request: requestFields(r), loginHint: rawEmail, name, emailVerified, error });
      return sendPage(res, 400, page);
    }
    sweep();
    const person = people.signIn(email, name);
    const code = randomToken();
    codes.set(code, { request: r, person, emailVerified, issuedAt: now(), used: false, accessTokens: [] });
    redirectBack(res, r, { code, scope: r.scope });
  });

  app.post('/token', form, (req, res) => {
    const body = (req.body ?? {}) as Params;
    const client = authenticateClient(req, body);
    if (typeof client === 'string') return tokenError(res, 401, 'invalid_client', client);
    const grantType = single(body, 'grant_type');
    if (grantType !== 'authorization_code') {
      return tokenError(res, 400, 'unsupported_grant_type', 'only grant_type=authorization_code is supported');
    }
    const code = single(body, 'code');
    if (!code) return tokenError(res, 400, 'invalid_request', 'code is required');
    const grant = codes.get(code);
    if (!grant || grant.request.clientId !== client.clientId) {
      return tokenError(res, 400, 'invalid_grant', 'unknown authorization code');
    }
    if (grant.used) {
      // A replayed code may have leaked: withdraw what it already bought.
      for (const t of grant.accessTokens) tokens.delete(t);
      return tokenError(res, 400, 'invalid_grant', 'authorization code was already used');
    }
    grant.used = true;
    if (now() - grant.issuedAt > CODE_LIFETIME_MS) return tokenError(res, 400, 'invalid_grant', 'authorization code expired');
    if (single(body, 'redirect_uri') !== grant.request.redirectUri) {
      return tokenError(res, 400, 'invalid_grant', 'redirect_uri does not match the authorization request');
    }
    const verifier = single(body, 'code_verifier');
    if (!verifier || !isPkceValue(verifier) || s256Challenge(verifier) !== grant.request.codeChallenge) {
      return tokenError(res, 400, 'invalid_grant', 'code_verifier does not match the code_challenge');
    }
    const issuedAt = now();
    const accessToken = randomToken();
    grant.accessTokens.push(accessToken);
    const { person, emailVerified, request } = grant;
    tokens.set(accessToken, {
      clientId: client.clientId,
      sub: person.sub,
      emailVerified,
      scope: request.scope,
      expiresAt: issuedAt + ACCESS_TOKEN_LIFETIME_S * 1000,
    });
    const iat = Math.floor(issuedAt / 1000);
    const claims = {
      iss: opts.issuer(),
      azp: client.clientId,
      aud: client.clientId,
      iat,
      exp: iat + ACCESS_TOKEN_LIFETIME_S,
      ...userInfo(person, emailVerified),
      ...(request.nonce !== undefined ? { nonce: request.nonce } : {}),
    };
    res.set({ 'Cache-Control': 'no-store', Pragma: 'no-cache' }).json({
      access_token: accessToken,
      expires_in: ACCESS_TOKEN_LIFETIME_S,
      token_type: 'Bearer',
      scope: request.scope,
      id_token: signJwtHs256(claims, client.clientSecret),
    });
  });

  app.get('/userinfo', (req, res) => {
    const token = bearerToken(req);
    if (token === null) {
      return res.status(400).json({ error: 'invalid_request', error_description: 'send the access token once, in the header or the query' });
    }
    if (token === undefined) {
      return res.status(401).set('WWW-Authenticate', 'Bearer').json({ error: 'invalid_request', error_description: 'access token missing' });
    }
    const grant = tokens.get(token);
    const person = grant && grant.expiresAt > now() ? people.get(grant.sub) : undefined;
    if (!grant || !person) {
      return res
        .status(401)
        .set('WWW-Authenticate', 'Bearer error="invalid_token"')
        .json({ error: 'invalid_token', error_description: 'unknown or expired access token' });
    }
    res.set('Cache-Control', 'no-store').json(userInfo(person, grant.emailVerified));
  });

  app.get('/avatar/:file', (req, res) => {
    const sub = /^(\d+)\.svg$/.exec(String(req.params.file))?.[1];
    const person = sub ? people.get(sub) : undefined;
    if (!person) return res.status(404).type('text/plain').send('no such avatar');
    res.type('image/svg+xml').set('Cache-Control', 'max-age=300').send(avatarSvg(person.name, person.sub));
  });

  app.get('/.well-known/openid-configuration', (_req, res) => {
    const issuer = opts.issuer();
    res.json({
      issuer,
      authorization_endpoint: `${issuer}/authorize`,
      token_endpoint: `${issuer}/token`,
      userinfo_endpoint: `${issuer}/userinfo`,
      response_types_supported: ['code'],
      grant_types_supported: ['authorization_code'],
      subject_types_supported: ['public'],
      id_token_signing_alg_values_supported: ['HS256'],
      code_challenge_methods_supported: ['S256'],
      token_endpoint_auth_methods_supported: ['client_secret_post', 'client_secret_basic'],
      scopes_supported: ['openid', 'email', 'profile'],
      claims_supported: ['iss', 'sub', 'aud', 'iat', 'exp', 'email', 'email_verified', 'name', 'given_name', 'family_name', 'picture'],
    });
  });

  app.use((_req: Request, res: Response) => {
    res.status(404).type('text/plain').send('not found');
  });
  app.use((err: unknown, _req: Request, res: Response, _next: express.NextFunction) => {
    const status = (err as { status?: number }).status ?? 500;
    res.status(status).type('text/plain').send(status < 500 ? 'bad request' : 'internal error');
  });
  return app;
}

export function urlFor(host: string, port: number): string {
  const shown = host === '0.0.0.0' ? '127.0.0.1' : host === '::' ? '::1' : host;
  return `http://${shown.includes(':') ? `[${shown}]` : shown}:${port}`;
}

export function listen(server: Server, port: number, host: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const onError = (err: NodeJS.ErrnoException) => {
      server.off('listening', onListening);
      reject(err.code === 'EADDRINUSE' ? new PortInUseError(host, port) : err);
    };
    const onListening = () => {
      server.off('error', onError);
      const address = server.address();
      resolve(typeof address === 'object' && address ? address.port : port);
    };
    server.once('error', onError);
    server.once('listening', onListening);
    server.listen(port, host);
  });
}

export async function startOAuthFake(opts: OAuthFakeOptions): Promise<OAuthFake> {
  const host = opts.host ?? '127.0.0.1';
  let url = '';
  const app = createOAuthApp({ clients: opts.clients, now: opts.now ?? Date.now, issuer: () => url });
  const server = createServer(app);
  const port = await listen(server, opts.port ?? 0, host);
  url = urlFor(host, port);
  return {
    url,
    port,
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.close((err) => (err ? reject(err) : resolve()));
        server.closeAllConnections();
      }),
  };
}
