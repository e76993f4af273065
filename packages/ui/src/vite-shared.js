/**
 * Settings both front-end apps share in their Vite config: the API paths the
 * dev server (and `vite preview`) forwards to the local API, and which
 * source files have no side effects. Plain JavaScript (types beside it in
 * vite-shared.d.ts): Vite loads a config's packages with Node itself, and
 * Node 20 cannot run TypeScript.
 */

/** Where the API listens in development; `FRYLINE_API_URL` in the environment overrides it. */
export const defaultApiUrl = 'http://127.0.0.1:3000';

export function apiProxy(target = defaultApiUrl) {
  return {
    '/api': { target },
    '/auth': { target },
    '/webhooks': { target },
  };
}

/**
 * The shared schema and UI modules only define values, so a bundle may leave out
 * the ones it does not use (zod with them, where a page needs no schema).
 */
export const sideEffectFreeSource = [{ test: /\/packages\/(schemas\/src\/|ui\/src\/.*\.tsx?$)/, sideEffects: false }];
