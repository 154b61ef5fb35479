import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

// SharedArrayBuffer needs a cross-origin isolated page. With these headers every asset must
// come from our own origin (keep them in public/).
const crossOriginIsolation = {
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Embedder-Policy': 'require-corp',
};

// The browser workbench: index.html at the repository root loads app/main.tsx.
export default defineConfig({
  plugins: [react()],
  worker: { format: 'es' },
  server: { headers: crossOriginIsolation },
  preview: { headers: crossOriginIsolation },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    target: 'es2022',
  },
});
