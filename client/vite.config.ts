import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

// The API the dev server (and preview) forward /api to; the lead's default is npm start's port.
const apiTarget = process.env.KEENROUTE_API_URL ?? 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
  },
  server: {
    host: '127.0.0.1',
    proxy: { '/api': apiTarget },
  },
  preview: { host: '127.0.0.1', proxy: { '/api': apiTarget } },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
  },
});
