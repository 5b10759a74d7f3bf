import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { publicModules } from '../.config/modules';

interface PackageJson {
  readonly name: string;
  readonly type: string;
  readonly sideEffects: boolean;
  readonly dependencies?: Record<string, string>;
  readonly engines: { readonly node: string };
  readonly exports: Record<string, unknown>;
  readonly files: readonly string[];
  readonly allowScripts?: Readonly<Record<string, boolean>>;
}

const pkg = JSON.parse(
  readFileSync(new URL('../package.json', import.meta.url), 'utf8'),
) as PackageJson;

describe('package.json', () => {
  it('is the headflow ESM package with no runtime dependency and no side effects', () => {
    expect(pkg.name).toBe('headflow');
    expect(pkg.type).toBe('module');
    expect(pkg.sideEffects).toBe(false);
    expect(pkg.dependencies ?? {}).toEqual({});
    expect(pkg.engines.node).toBe('>=20');
    expect(pkg.files).toContain('dist');
  });

  it('exports the root and exactly one subpath per public module, each with ESM and CJS types', () => {
    const subpaths = Object.keys(pkg.exports).filter((k) => k !== '.' && k !== './package.json');
    expect(subpaths.sort()).toEqual(publicModules.map((m) => `./${m}`).sort());
    for (const m of publicModules) {
      expect(pkg.exports[`./${m}`]).toEqual({
        import: { types: `./dist/${m}/index.d.ts`, default: `./dist/${m}/index.js` },
        require: { types: `./dist/${m}/index.d.cts`, default: `./dist/${m}/index.cjs` },
      });
    }
  });

  it('re-exports every public module from the root barrel', () => {
    const root = readFileSync(new URL('../src/index.ts', import.meta.url), 'utf8');
    for (const m of publicModules) expect(root).toContain(`export * from './${m}/index';`);
  });
});

describe('install scripts', () => {
  it('every locked dependency with an install script is reviewed in allowScripts (npm 11 warns otherwise)', () => {
    const lock = JSON.parse(
      readFileSync(new URL('../package-lock.json', import.meta.url), 'utf8'),
    ) as {
      readonly packages: Readonly<Record<string, { readonly hasInstallScript?: boolean }>>;
    };
    const withScripts = Object.entries(lock.packages)
      .filter(([, p]) => p.hasInstallScript === true)
      .map(([path]) => path.slice(path.lastIndexOf('node_modules/') + 'node_modules/'.length));
    expect(withScripts.length).toBeGreaterThan(0);
    for (const name of withScripts) expect(pkg.allowScripts?.[name], name).toBeTypeOf('boolean');
  });
});
