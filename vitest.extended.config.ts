import { defineConfig } from 'vitest/config';

// The extended validation: the presets' default (sized) runs, minutes each, so kept out of npm test's 15 minutes.
// `npm run validate:extended`; it builds the command line once, as the main configuration does.
export default defineConfig({
  test: {
    include: ['tests/extended/**/*.test.ts'],
    environment: 'node',
    testTimeout: 1_800_000,
    hookTimeout: 600_000,
    pool: 'forks',
    fileParallelism: false,
    globalSetup: ['tests/setup/buildCli.ts'],
  },
});
