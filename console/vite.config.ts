import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

const defaultApiPort = 4310;

// The console talks to the API on the same origin; in development and preview the
// /v1 prefix is forwarded to the API process on loopback.
function apiTarget(): string {
  const raw = process.env.LEASTLINE_API_PORT;
  if (raw === undefined || raw === '') return `http://127.0.0.1:${defaultApiPort}`;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new Error(`LEASTLINE_API_PORT must be a TCP port number (1-65535), got "${raw}"`);
  }
  return `http://127.0.0.1:${port}`;
}

const proxy = {
  '/v1': { target: apiTarget(), changeOrigin: false },
};

export default defineConfig({
  base: '/',
  plugins: [react()],
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
  },
  server: { host: '127.0.0.1', proxy },
  preview: { host: '127.0.0.1', proxy },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // Sizes (raw and gzip) are printed per chunk; route pages are split by their lazy imports.
    reportCompressedSize: true,
    // The Monaco chunk only loads on the playground route and is expected to be large.
    chunkSizeWarningLimit: 4000,
  },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.spec.{ts,tsx}'],
    setupFiles: ['src/testing/jsdom-shims.ts'],
    restoreMocks: true,
    css: false,
  },
});
