import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';
import { workspaceAliases } from './vitest.config.ts';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

/** The API server listens here in development (apps/server). */
const apiTarget = 'http://localhost:3000';

export default defineConfig(({ mode }) => ({
  root: here('./apps/web'),
  plugins: [react()],
  resolve: {
    alias: {
      ...workspaceAliases,
      // `vite build --mode profile` (npm run bench) uses React's profiling build so <Profiler> counts renders.
      ...(mode === 'profile' ? { 'react-dom/client': 'react-dom/profiling' } : {}),
    },
  },
  build: {
    outDir: here('./apps/web/dist'),
    emptyOutDir: true,
    // The manifest lets `npm run bench` add up what a route loads at first visit.
    manifest: true,
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
}));
