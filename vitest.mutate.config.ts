import { defineConfig } from 'vitest/config';

// The tests Stryker runs against each mutant (stryker.config.mjs): the physics and solver
// tests. For the physics the large-grid tests are left out: they exercise the sparse solvers'
// scale rather than a coefficient and would make every covering mutant take seconds.
const physicsOnly = process.env.MUTATE_SCOPE !== 'solver';
export default defineConfig({
  test: {
    include: ['test/physics/**/*.test.ts', 'test/solver/**/*.test.ts'],
    exclude: physicsOnly
      ? [
          'test/solver/large.test.ts',
          'test/solver/linearSolver.test.ts',
          'test/solver/sparseMultigrid.test.ts',
        ]
      : ['test/solver/large.test.ts'],
    environment: 'node',
    testTimeout: 60000,
  },
});
