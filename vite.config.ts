import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { contentSecurityPolicy } from './build/csp.ts';

export default defineConfig({
  plugins: [react(), contentSecurityPolicy()],
  server: { port: 5173, strictPort: true, host: '127.0.0.1' },
  preview: { port: 4173, strictPort: true, host: '127.0.0.1' },
  build: { outDir: 'dist', sourcemap: true },
});
