export { startOAuthFake, PortInUseError, CODE_LIFETIME_MS, ACCESS_TOKEN_LIFETIME_S } from './server.js';
export type { OAuthClient, OAuthFake, OAuthFakeOptions } from './server.js';
export { DEMO_ACCOUNTS, subForEmail } from './accounts.js';
export type { DemoAccount } from './accounts.js';
export { s256Challenge } from './protocol.js';
