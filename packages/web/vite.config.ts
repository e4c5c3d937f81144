/// <reference types="vitest/config" />
import path from 'node:path';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

export default defineConfig({
  plugins: [react()],
  resolve: {
    // Compile core's TypeScript source directly, so the web app never waits on core's build.
    alias: [
      {
        find: /^@tallyloom\/core$/,
        replacement: path.resolve(import.meta.dirname, '../core/src/index.ts'),
      },
      { find: /^@\//, replacement: `${path.resolve(import.meta.dirname, 'src')}/` },
    ],
  },
  server: {
    port: 5173,
    strictPort: true,
    proxy: {
      '/api': 'http://localhost:3000',
    },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
  },
  test: {
    environment: 'jsdom',
    setupFiles: ['./src/testing/setup-tests.ts'],
    include: ['src/**/*.test.{ts,tsx}'],
    // Each test stubs fetch for itself; restore the real globals afterwards.
    unstubGlobals: true,
    restoreMocks: true,
    testTimeout: 20_000,
  },
});
