import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';

// The server listens on 127.0.0.1 by default (HOST); name it, so "localhost" resolving to ::1 first cannot miss it.
const apiTarget = `http://127.0.0.1:${process.env.PORT || 3000}`;

export default defineConfig({
  plugins: [react()],
  // The web client compiles @upwell/common from its TypeScript source, like the tests do.
  resolve: { alias: { '@upwell/common': fileURLToPath(new URL('../common/src/index.ts', import.meta.url)) } },
  server: {
    port: 5173,
    proxy: { '/api': apiTarget, '/socket.io': { target: apiTarget, ws: true } },
  },
  build: { outDir: 'dist', sourcemap: true, chunkSizeWarningLimit: 1200 },
});
