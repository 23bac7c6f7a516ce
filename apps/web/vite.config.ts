// eslint-disable-next-line @typescript-eslint/triple-slash-reference -- STACK.md's recipe; harmless beside the import below
/// <reference types="vitest/config" />
import react from '@vitejs/plugin-react';
import { defaultClientConditions } from 'vite';
// From vitest/config rather than vite: vitest brings its own vite (8.4.0 beside our pinned 8.3.8),
// and its `test` typing only augments that copy.
import { defineConfig } from 'vitest/config';

const lazyIconPaths = /@blueprintjs[\\/]icons[\\/]lib[\\/]esm[\\/](allPaths|paths-loaders|generated[\\/](16|20)px)/;

export default defineConfig({
  plugins: [react()],
  // 'source' lets Vite read @tressury/domain's TypeScript directly (see STACK.md, "Sharing libs/domain").
  resolve: { conditions: ['source', ...defaultClientConditions] },
  server: { proxy: { '/api': 'http://127.0.0.1:3000' } },
  build: {
    rolldownOptions: {
      output: {
        // Libraries change less often than the app: separate chunks stay cached across releases.
        codeSplitting: {
          groups: [
            { name: 'react', test: /node_modules[\\/](react|react-dom|react-router|scheduler)[\\/]/, priority: 20 },
            {
              name: 'blueprint',
              // Icon paths stay in their own lazy chunks, loaded only if a string icon name is used.
              test: (id: string) => /node_modules[\\/]@blueprintjs[\\/]/.test(id) && !lazyIconPaths.test(id),
              priority: 10,
            },
          ],
        },
      },
    },
  },
  test: {
    environment: 'happy-dom',
    // Relative API paths need a page address to resolve against.
    environmentOptions: { happyDOM: { url: 'http://127.0.0.1:5173/' } },
    setupFiles: ['src/test-setup.ts'],
    include: ['src/**/*.test.{ts,tsx}'],
    testTimeout: 15_000,
  },
});
