import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// The root index.html loads app/main.tsx. No network access is needed at run time.
export default defineConfig({
  plugins: [react()],
  // The engine must run in a browser: guard against stray Node globals (src/boolean/engine.ts
  // reads process.env.DBG for debugging; see /tmp/kern/ui-requests.md).
  define: { 'process.env.DBG': 'undefined' },
  worker: { format: 'es' },
  server: { open: false },
  build: { outDir: 'dist', sourcemap: false, chunkSizeWarningLimit: 2000 },
});
