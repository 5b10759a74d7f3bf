import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// This file lives in .config/; the project root is one folder up.
const root = fileURLToPath(new URL('../', import.meta.url));
const src = fileURLToPath(new URL('../src/', import.meta.url));

export default defineConfig({
  root,
  resolve: {
    // Examples and docs import 'headflow' as users do; in tests that name is the source tree.
    alias: [
      { find: /^headflow$/, replacement: `${src}index.ts` },
      { find: /^headflow\/(.+)$/, replacement: `${src}$1/index.ts` },
    ],
  },
  test: {
    include: ['tests/**/*.test.ts'],
    setupFiles: ['tests/setup/fast-check.ts'],
    typecheck: {
      enabled: true,
      include: ['tests/**/*.test-d.ts'],
      tsconfig: './tsconfig.json',
    },
    coverage: {
      provider: 'v8',
      include: ['src/**/*.ts'],
      exclude: ['src/**/index.ts', 'src/cli/main.ts'],
      reporter: ['text-summary', 'text'],
      thresholds: { lines: 90, branches: 90, functions: 90, statements: 90 },
    },
  },
});
