#!/usr/bin/env node
/**
 * The `headflow` command's entry: connects {@link runCli} to the process's arguments,
 * streams and files, and exits with its code.
 *
 * @module
 */
import { readFileSync } from 'node:fs';
import { readFile, writeFile } from 'node:fs/promises';
import { runCli } from './run';

/** The package's version, from its package.json (two folders up from dist/cli/). */
function version(): string {
  for (const up of ['../../package.json', '../package.json']) {
    try {
      const pkg = JSON.parse(readFileSync(new URL(up, import.meta.url), 'utf8')) as {
        name?: unknown;
        version?: unknown;
      };
      if (pkg.name === 'headflow' && typeof pkg.version === 'string') return pkg.version;
    } catch {
      // not there: try the next place
    }
  }
  return 'unknown';
}

// A reader that stops early (`headflow lift.json | head`) closes the pipe: stop quietly.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw e;
});

const code = await runCli(
  process.argv.slice(2),
  {
    stdout: (text) => process.stdout.write(text),
    stderr: (text) => process.stderr.write(text),
    readFile: (path) => readFile(path, 'utf8'),
    writeFile: (path, text) => writeFile(path, text, 'utf8'),
  },
  { version: version() },
);
process.exitCode = code;
