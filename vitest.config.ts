import { configDefaults, defineConfig } from 'vitest/config';

// Node-side tests only: unit tests and long-running validation simulations. Browser tests are
// Playwright's (tests/e2e/*.spec.ts), so the two runners never pick up each other's files.
export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    // Runs of several minutes each (the sized defaults): `npm run validate:extended`, outside npm test.
    exclude: [...configDefaults.exclude, 'tests/extended/**'],
    environment: 'node',
    // Validation tests run whole simulations; 10 minutes each at most.
    testTimeout: 600_000,
    hookTimeout: 600_000,
    pool: 'forks',
    // Builds dist-cli/ once so tests can spawn the command line (node dist-cli/tenuis.mjs).
    globalSetup: ['tests/setup/buildCli.ts'],
  },
});
