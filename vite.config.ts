import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression } from 'vite-plugin-compression2';
import { fileURLToPath } from 'node:url';

const apiPort = Number(process.env.PORT ?? 3000);

export default defineConfig({
  // Brotli and gzip copies of scripts, styles and SVGs, served by the server as they are.
  plugins: [react(), tailwindcss(), compression({ include: /\.(js|css|svg)$/, algorithms: ['brotliCompress', 'gzip'], logLevel: 'silent' })],
  resolve: {
    alias: {
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
      '@': fileURLToPath(new URL('./src', import.meta.url)),
    },
  },
  // manifest: the server names the current page's chunks in the shell it answers (server/lib/client-shell.ts)
  build: { outDir: 'dist/client', emptyOutDir: true, sourcemap: true, manifest: true },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false } },
  },
});
