import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { workspaceAliases } from './vitest.config.ts';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

/** The API server listens here in development (apps/server). */
const apiTarget = 'http://localhost:3000';

export default defineConfig({
  root: here('./apps/web'),
  plugins: [react()],
  resolve: { alias: workspaceAliases },
  build: {
    outDir: here('./apps/web/dist'),
    emptyOutDir: true,
  },
  server: {
    proxy: {
      '/api': { target: apiTarget, changeOrigin: true },
      '/socket.io': { target: apiTarget, ws: true, changeOrigin: true },
    },
  },
  preview: {
    proxy: {
      '/api': { target: apiTarget, changeOrigin: true },
      '/socket.io': { target: apiTarget, ws: true, changeOrigin: true },
    },
  },
});
