/**
 * Settings both front-end apps share in their Vite config: the API paths the
 * dev server (and `vite preview`) forwards to the local API, and where the
 * shared UI source lives. Plain values only, so this file needs no imports.
 */

/** Where the API listens in development; `FRYLINE_API_URL` in the environment overrides it. */
export const defaultApiUrl = 'http://127.0.0.1:3000';

export function apiProxy(target: string = defaultApiUrl) {
  return {
    '/api': { target },
    '/auth': { target },
    '/webhooks': { target },
  };
}

/** `@fryline/ui/<file>` → packages/ui/src/<file>. */
export const uiAlias = { '@fryline/ui': new URL('.', import.meta.url).pathname.replace(/\/$/, '') };

/**
 * The shared schema modules only define values, so a bundle may leave out
 * the ones it does not use (zod with them, where a page needs no schema).
 */
export const sideEffectFreeSource = [{ test: /\/packages\/schemas\/src\//, sideEffects: false }];
