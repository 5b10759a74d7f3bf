// The consumer check: the package as a user installs it. Packs the built package (`npm pack`),
// installs the tarball into a new project outside this repository that has only TypeScript
// (linked from this checkout, so no network is needed), and then
//   - typechecks strict files WITHOUT skipLibCheck for module nodenext (ESM .mts and CommonJS
//     .cts) and for moduleResolution bundler, with no @types and only the ES2022 library, so
//     the declarations may import nothing outside the package;
//   - compiles the nodenext files and runs them with Node;
//   - `deno check` and `deno run` a file that imports the installed package with its types.
// Run by `npm run test:consumer` after `npm run build` (part of `npm test`).
// Set HEADFLOW_KEEP_CONSUMER=1 to keep the temporary project for a look.
import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../', import.meta.url));
const fixtures = fileURLToPath(new URL('./fixtures/', import.meta.url));
const typescript = join(root, 'node_modules', 'typescript');
const deno = join(root, 'node_modules', '.bin', 'deno');
const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';

const work = mkdtempSync(join(tmpdir(), 'headflow-consumer-'));
const project = join(work, 'project');
let passed = 0;
let failed = 0;

/** Runs a command; returns its result, printing its output when it fails. */
function sh(command, args, cwd, env = {}) {
  const r = spawnSync(command, args, {
    cwd,
    encoding: 'utf8',
    env: { ...process.env, ...env },
    maxBuffer: 1 << 26,
  });
  if (r.error !== undefined) throw r.error;
  return r;
}

function step(name, result, check = () => true) {
  const ok = result.status === 0 && check(result);
  if (ok) passed++;
  else failed++;
  console.log(`${ok ? 'ok  ' : 'FAIL'} ${name}`);
  if (!ok) console.log(`${result.stdout}\n${result.stderr}`.trim().slice(0, 4000));
  return ok;
}

const strict = {
  strict: true,
  noUncheckedIndexedAccess: true,
  exactOptionalPropertyTypes: true,
  skipLibCheck: false,
  types: [],
  lib: ['ES2022'],
  target: 'ES2022',
};

try {
  // 1. The tarball, exactly as it would be published.
  const pack = sh(npm, ['pack', '--json', '--pack-destination', work], root);
  if (!step('npm pack', pack)) throw new Error('npm pack failed');
  const tarball = join(work, JSON.parse(pack.stdout)[0].filename);

  // 2. A project with only TypeScript and the tarball, offline.
  mkdirSync(project);
  writeFileSync(
    join(project, 'package.json'),
    `${JSON.stringify({ name: 'consumer', private: true, type: 'module' }, null, 2)}\n`,
  );
  const install = sh(
    npm,
    [
      'install',
      '--offline',
      '--no-audit',
      '--no-fund',
      '--ignore-scripts',
      '--no-package-lock',
      tarball,
      typescript,
    ],
    project,
  );
  if (!step('npm install the tarball and typescript (offline)', install)) {
    throw new Error('install failed');
  }
  const installed = readdirSync(join(project, 'node_modules')).filter((n) => !n.startsWith('.'));
  step(
    'the project has only headflow and typescript',
    { status: 0, stdout: installed.join(' '), stderr: '' },
    () => installed.sort().join(' ') === 'headflow typescript',
  );

  for (const file of ['esm.mts', 'cjs.cts', 'bundler.ts', 'deno.ts']) {
    copyFileSync(join(fixtures, file), join(project, file));
  }
  const configs = {
    'tsconfig.nodenext.json': {
      compilerOptions: {
        ...strict,
        module: 'nodenext',
        moduleResolution: 'nodenext',
        outDir: 'out',
      },
      files: ['esm.mts', 'cjs.cts'],
    },
    'tsconfig.bundler.json': {
      compilerOptions: { ...strict, module: 'esnext', moduleResolution: 'bundler', noEmit: true },
      files: ['bundler.ts'],
    },
  };
  for (const [name, config] of Object.entries(configs)) {
    writeFileSync(join(project, name), `${JSON.stringify(config, null, 2)}\n`);
  }
  const tsc = join(project, 'node_modules', 'typescript', 'bin', 'tsc');

  // 3. Strict typechecks without skipLibCheck; the nodenext one also emits.
  step(
    'tsc: module nodenext, ESM (.mts) and CommonJS (.cts), no skipLibCheck',
    sh(process.execPath, [tsc, '-p', 'tsconfig.nodenext.json'], project),
  );
  step(
    'tsc: moduleResolution bundler, no skipLibCheck',
    sh(process.execPath, [tsc, '-p', 'tsconfig.bundler.json'], project),
  );

  // 4. The compiled files under Node.
  step(
    'node: the ESM file',
    sh(process.execPath, ['out/esm.mjs'], project),
    (r) =>
      r.stdout.includes('esm 106.68 m 75.708 L/s') &&
      r.stdout.includes('esm refused true report true number'),
  );
  step('node: the CommonJS file', sh(process.execPath, ['out/cjs.cjs'], project), (r) =>
    r.stdout.includes('cjs 4.026 in 101.325 kPa true'),
  );

  // 5. Deno with the installed package's types: it resolves `headflow` through the project's
  // package.json and node_modules; `--all` checks the package's declarations too.
  const denoEnv = { DENO_NO_UPDATE_CHECK: '1', NO_COLOR: '1' };
  step('deno check', sh(deno, ['check', '--all', '--no-lock', 'deno.ts'], project, denoEnv));
  step(
    'deno run',
    sh(deno, ['run', '--no-lock', '--no-prompt', 'deno.ts'], project, denoEnv),
    (r) => r.stdout.includes('deno 983.2 kg/m3 number'),
  );
} catch (e) {
  failed++;
  console.log(`FAIL ${e instanceof Error ? e.message : String(e)}`);
} finally {
  if (process.env.HEADFLOW_KEEP_CONSUMER === '1') console.log(`kept ${work}`);
  else rmSync(work, { recursive: true, force: true });
}

console.log(`consumer check: ${passed} passed, ${failed} failed`);
process.exit(failed === 0 ? 0 : 1);
