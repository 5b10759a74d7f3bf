import { defineConfig } from 'tsup';
import { publicModules } from './modules';

/** One entry for the root barrel and one per public module (see package.json "exports"). */
const entry: Record<string, string> = { index: 'src/index.ts' };
for (const name of publicModules) entry[`${name}/index`] = `src/${name}/index.ts`;

// The chart's scales and the scenario-file schema come from small, well-kept libraries that
// are bundled into the entries that use them, so the package keeps no runtime dependency.
const bundled = [/^d3-/, /^internmap$/, /^valibot$/];

export default defineConfig([
  {
    entry,
    format: ['esm', 'cjs'],
    dts: true,
    clean: true,
    sourcemap: true,
    splitting: true,
    treeshake: true,
    target: 'es2022',
    outDir: 'dist',
    noExternal: bundled,
  },
  {
    // The `headflow` command: ESM only (its entry awaits at top level), after the library.
    entry: { 'cli/main': 'src/cli/main.ts' },
    format: ['esm'],
    dts: false,
    clean: false,
    splitting: false,
    sourcemap: true,
    target: 'node20',
    outDir: 'dist',
    noExternal: bundled,
  },
]);
