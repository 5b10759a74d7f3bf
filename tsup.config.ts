import { defineConfig } from 'tsup';
import { publicModules } from './scripts/modules';

/** One entry for the root barrel and one per public module (see package.json "exports"). */
const entry: Record<string, string> = { index: 'src/index.ts' };
for (const name of publicModules) entry[`${name}/index`] = `src/${name}/index.ts`;

export default defineConfig({
  entry,
  format: ['esm', 'cjs'],
  dts: true,
  clean: true,
  sourcemap: true,
  splitting: true,
  treeshake: true,
  target: 'es2022',
  outDir: 'dist',
  // The chart's scales and the scenario-file schema come from small, well-kept libraries that
  // are bundled into the report and CLI entries, so the package keeps no runtime dependency.
  noExternal: [/^d3-/, /^internmap$/, /^valibot$/],
});
