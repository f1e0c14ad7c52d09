// @ts-nocheck
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: { alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) } },
  // The server, worker and command-line bundles go beside it in dist/ (server/build.mjs).
  build: { outDir: 'dist/client', emptyOutDir: true },
});
