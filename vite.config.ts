import { defineConfig } from 'vite';

// The workbench: built from web/ into dist/web, served by scripts/serve.mjs. Relative asset
// paths so the build works from any folder of a static server.
export default defineConfig({
  root: 'web',
  base: './',
  publicDir: false,
  build: {
    outDir: '../dist/web',
    emptyOutDir: true,
    target: 'es2022',
    chunkSizeWarningLimit: 4000,
    assetsInlineLimit: 0,
  },
  worker: { format: 'es' },
  server: { host: '127.0.0.1' },
});
