import { defineConfig, loadEnv } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { apiProxy, sideEffectFreeSource } from '@fryline/ui/vite';

export default defineConfig(({ mode }) => {
  const proxy = apiProxy(loadEnv(mode, import.meta.dirname, 'FRYLINE_').FRYLINE_API_URL);
  return {
    plugins: [react(), tailwindcss()],
    build: { outDir: 'dist', rolldownOptions: { treeshake: { moduleSideEffects: sideEffectFreeSource } } },
    server: { port: 5173, strictPort: true, proxy },
    preview: { proxy },
  };
});
