import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

const fromHere = (path: string): string => fileURLToPath(new URL(path, import.meta.url));

const API_TARGET = 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [react()],
  // The server serves the built player app under /play/.
  base: '/play/',
  resolve: {
    alias: {
      '@/': fromHere('./src/'),
      // Compile shared-types from source so the app never depends on its dist build.
      '@covalent/shared-types': fromHere('../shared-types/src/index.ts'),
    },
  },
  server: {
    port: 5174,
    strictPort: true,
    proxy: {
      '/api': { target: API_TARGET, changeOrigin: true },
      '/socket.io': { target: API_TARGET, ws: true, changeOrigin: true },
    },
  },
  build: {
    target: 'es2022',
  },
  test: {
    environment: 'jsdom',
    setupFiles: ['./src/test/setup.ts'],
    include: ['src/**/*.test.{ts,tsx}'],
    restoreMocks: true,
    unstubGlobals: true,
  },
});
