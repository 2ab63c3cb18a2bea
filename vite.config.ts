import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';

// The root index.html loads app/main.tsx. No network access is needed at run time.
export default defineConfig({
  plugins: [react()],
  worker: { format: 'es' },
  server: { open: false },
  build: { outDir: 'dist', sourcemap: false, chunkSizeWarningLimit: 2000 },
});
