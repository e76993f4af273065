import request from 'supertest';
import { Browser, signIn, type Stack } from './support.js';

/**
 * A signed-in person driven through supertest: the session cookie from the
 * real sign-in flow, and the CSRF token on every change, as the apps send them.
 */
export async function signedInAgent(stack: Stack, email: string) {
  const browser = new Browser(stack.url);
  await signIn(browser, email);
  const token = await browser.csrf();
  const withSession = <T extends request.Test>(test: T) => test.set('cookie', browser.cookieHeader());
  const changing = <T extends request.Test>(test: T) => withSession(test).set('x-csrf-token', token);
  const http = () => request(stack.url);
  return {
    browser,
    get: (path: string) => withSession(http().get(path)),
    post: (path: string) => changing(http().post(path)),
    put: (path: string) => changing(http().put(path)),
    patch: (path: string) => changing(http().patch(path)),
    delete: (path: string) => changing(http().delete(path)),
  };
}

export type Agent = Awaited<ReturnType<typeof signedInAgent>>;
