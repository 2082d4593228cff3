import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import { contentSecurityPolicy, DEV_HEADERS, PAGE_HEADERS } from './build/csp.ts';

/**
 * Every module the page's entry imports statically (its first view), found once the module graph is
 * complete. The build keeps them in one chunk: split over the shared chunks that automatic code splitting
 * makes (modules the lazily loaded pages use too), each compressed alone, they cost a few kB more.
 */
function firstViewModules(): { plugin: Plugin; has: (id: string) => boolean } {
  const first = new Set<string>();
  const plugin: Plugin = {
    name: 'polewright-first-view',
    apply: 'build',
    buildEnd() {
      const entries = [...this.getModuleIds()].filter((id) => this.getModuleInfo(id)?.isEntry);
      const stack = [...entries];
      while (stack.length > 0) {
        const id = stack.pop()!;
        if (first.has(id)) continue;
        first.add(id);
        stack.push(...(this.getModuleInfo(id)?.importedIds ?? []));
      }
    },
  };
  return { plugin, has: (id) => first.has(id) };
}

const firstView = firstViewModules();

export default defineConfig({
  plugins: [react(), contentSecurityPolicy(), firstView.plugin],
  server: { port: 5173, strictPort: true, host: '127.0.0.1', headers: DEV_HEADERS },
  preview: { port: 4173, strictPort: true, host: '127.0.0.1', headers: PAGE_HEADERS },
  build: {
    outDir: 'dist',
    sourcemap: true,
    rolldownOptions: {
      output: { codeSplitting: { groups: [{ name: 'first-view', test: (id) => firstView.has(id) }] } },
    },
  },
});
