import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

const apiOrigin = process.env.VATSIDE_API_ORIGIN ?? 'http://127.0.0.1:4400';

// The server hosts this build at / on the same origin as the API. `vite build --ssr` builds
// src/entry-server.tsx into dist-server/: the server writes landing pages' first HTML with it.
export default defineConfig(({ isSsrBuild }) => ({
  base: '/',
  plugins: [react(), tailwindcss()],
  server: {
    host: '127.0.0.1',
    proxy: {
      '/api': { target: apiOrigin, changeOrigin: true },
      '/socket.io': { target: apiOrigin, ws: true, changeOrigin: true },
    },
  },
  // The manifest's import graph is what the first-screen JS budget test and bench:viewer read.
  build: isSsrBuild
    ? { outDir: 'dist-server', copyPublicDir: false }
    : { outDir: 'dist', manifest: true },
  // Our own packages are TypeScript sources: bundled in, while React and the rest load from
  // node_modules.
  ssr: { noExternal: [/^@vatside\//] },
  test: {
    name: 'viewer',
    environment: 'jsdom',
    // Generous: CI runs every project at once on two cores.
    testTimeout: 30_000,
    setupFiles: ['./src/testing/setup.ts'],
  },
}));
