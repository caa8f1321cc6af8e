import { sveltekit } from '@sveltejs/kit/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  plugins: [sveltekit()],
  resolve: process.env.VITEST ? { conditions: ['browser'] } : undefined,
  // The per-plugin timing table is for whoever tunes the build, not for someone starting the app.
  build: { rolldownOptions: { checks: { bundlerTimings: false } } },
  test: {
    include: ['test/**/*.test.ts', 'src/**/*.test.ts'],
    environment: 'node',
    // Generous: the big-mesh and hostile-file tests take 1-5 s on a quiet 2-core machine and
    // several times that while other work shares it. Time is measured by the bench, never here.
    testTimeout: 60_000,
    globalSetup: ['test/globalSetup.ts'],
  },
});
