import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

/** The backend in development (`npm start` serves it on port 3000). */
const BACKEND = 'http://127.0.0.1:3000';

export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) },
    // The workspace root holds React 18 (hoisted for Blueprint's peer ranges) while this package
    // has React 19; every import of React must get this package's copy, or elements from two
    // Reacts meet at run time.
    dedupe: ['react', 'react-dom'],
  },
  server: {
    proxy: {
      '/graphql': BACKEND,
      '/api': BACKEND,
      '/health': BACKEND,
      '/dev': BACKEND,
    },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // d3, Blueprint and its table make one large vendor chunk; that is expected for this app.
    chunkSizeWarningLimit: 2500,
  },
});
