import { defineConfig, loadEnv } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { VitePWA } from 'vite-plugin-pwa';
import { apiProxy, sideEffectFreeSource } from '@fryline/ui/vite';

// Served by the API under /staff/; the shop has the site root.
export default defineConfig(({ mode }) => {
  const proxy = apiProxy(loadEnv(mode, import.meta.dirname, 'FRYLINE_').FRYLINE_API_URL);
  return {
    base: '/staff/',
    plugins: [
      react(),
      tailwindcss(),
      // The app shell (HTML, scripts, styles, fonts) kept by a service worker, so
      // the counter opens on a phone with no signal; API answers are kept by the
      // query cache in IndexedDB, not here.
      VitePWA({
        registerType: 'autoUpdate',
        injectRegister: false,
        manifest: false,
        workbox: {
          globPatterns: ['**/*.{js,css,html,woff2,svg}'],
          navigateFallback: '/staff/index.html',
          navigateFallbackAllowlist: [/^\/staff(\/|$)/],
          cleanupOutdatedCaches: true,
          // the first visit's page is looked after at once, so a reload with no signal still opens
          clientsClaim: true,
          skipWaiting: true,
        },
      }),
    ],
    build: { outDir: 'dist', rolldownOptions: { treeshake: { moduleSideEffects: sideEffectFreeSource } } },
    server: { port: 5174, strictPort: true, proxy },
    preview: { proxy },
  };
});
