import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import { compression } from 'vite-plugin-compression2';

const src = fileURLToPath(new URL('./src', import.meta.url));

export default defineConfig({
  // Build-time .br and .gz copies beside each file: the server sends them as they are (no compression per request).
  plugins: [react(), compression({ algorithms: ['brotliCompress', 'gzip'], include: /\.(js|css|html|svg)$/ })],
  resolve: {
    alias: {
      '@': src,
      // Tests and the dev server read shared/ from source; the build does too.
      '@broodsilk/shared': fileURLToPath(new URL('../shared/src/index.ts', import.meta.url)),
    },
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${process.env.PORT ?? 3000}` },
  },
  build: {
    chunkSizeWarningLimit: 900,
    manifest: true,
    rollupOptions: {
      output: {
        // Two vendor chunks that change rarely and stay cached across releases: React with its router, and
        // Mantine's core (every page uses it; one file instead of some thirty small ones costs 9 KB gzip
        // more). Date pickers and the file drop are left out, so they travel with the pages that use them.
        manualChunks: (id: string) =>
          /node_modules\/(react|react-dom|react-router|scheduler|cookie|set-cookie-parser)\//.test(id)
            ? 'react'
            : /node_modules\/(@mantine\/(core|hooks|notifications)|@floating-ui)\//.test(id)
              ? 'mantine'
              : undefined,
      },
    },
  },
  test: {
    environment: 'jsdom',
    setupFiles: ['./test/setup.ts'],
    css: false,
    include: ['src/**/*.test.{ts,tsx}', 'test/**/*.test.{ts,tsx}'],
  },
});
