import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { contentSecurityPolicy, DEV_HEADERS, PAGE_HEADERS } from './build/csp.ts';

export default defineConfig({
  plugins: [react(), contentSecurityPolicy()],
  server: { port: 5173, strictPort: true, host: '127.0.0.1', headers: DEV_HEADERS },
  preview: { port: 4173, strictPort: true, host: '127.0.0.1', headers: PAGE_HEADERS },
  build: { outDir: 'dist', sourcemap: true },
});
