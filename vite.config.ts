import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// The API runs in the same process in dev (Vite middleware mode, see server/index.ts),
// so no proxy is needed there; `apiProxyTarget` serves `vite` run on its own.
const apiProxyTarget = process.env.API_PROXY_TARGET ?? 'http://localhost:3000';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: {
    proxy: { '/api': apiProxyTarget, '/uploads': apiProxyTarget },
  },
  build: {
    outDir: 'dist',
    sourcemap: false,
  },
});
