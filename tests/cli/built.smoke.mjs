// Runs the built `headflow` command (dist/cli/main.js, the package's bin) on the example
// scenario files and checks its exit codes. Run by `npm run test:cli` after `npm run build`.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const bin = new URL('../../dist/cli/main.js', import.meta.url).pathname;
const example = (name) => new URL(`../../docs/examples/${name}`, import.meta.url).pathname;
const out = mkdtempSync(join(tmpdir(), 'headflow-cli-'));
let passed = 0;
let failed = 0;

function run(name, args, expectedCode, check = () => true) {
  const r = spawnSync(process.execPath, [bin, ...args], { encoding: 'utf8' });
  const ok = r.status === expectedCode && check(r);
  if (ok) passed++;
  else failed++;
  console.log(`${ok ? 'ok  ' : 'FAIL'} ${name}: exit ${r.status} (expected ${expectedCode})`);
  if (!ok) console.log(r.stdout.slice(0, 400), r.stderr.slice(0, 400));
}

run('--version', ['--version'], 0, (r) => /^headflow \d+\.\d+\.\d+/.test(r.stdout));
run('orchard-tank.json passes', [example('orchard-tank.json')], 0, (r) =>
  r.stdout.startsWith('Pump selection report'),
);
const svg = join(out, 'canal.svg');
run(
  'canal-lift.json: pump A fails a check, the recommended pump B passes',
  [example('canal-lift.json'), '--chart', svg, '-f', 'json'],
  0,
  (r) => {
    const envelope = JSON.parse(r.stdout);
    return (
      envelope.format === 'headflow-report/2' &&
      envelope.report.verdict.passing === 1 &&
      readFileSync(svg, 'utf8').includes('</svg>')
    );
  },
);
run('canal-lift.json as one HTML page', [example('canal-lift.json'), '-f', 'html'], 0, (r) =>
  r.stdout.startsWith('<!doctype html>'),
);
run(
  'select ranks the invented catalogue for canal-lift.json',
  ['select', example('canal-lift.json'), '--catalogue', example('pump-catalogue.json')],
  0,
  (r) => r.stdout.startsWith('Pump selection: Canal lift to hillside tank'),
);
const schematic = join(out, 'booster.svg');
run(
  'booster-floors.json (a network, service pressures): the drive set passes; schematic written',
  [example('booster-floors.json'), '--schematic', schematic, '-f', 'json'],
  0,
  (r) => {
    const envelope = JSON.parse(r.stdout);
    return (
      envelope.report.verdict.recommended === 'booster B-40, drive' &&
      envelope.report.duty[0].network.nodes.length === 15 &&
      readFileSync(schematic, 'utf8').includes('</svg>')
    );
  },
);
run(
  'ring-main.json (a looped network with a control valve) passes',
  [example('ring-main.json')],
  0,
  (r) => r.stdout.includes('Network at the duty: peak draw'),
);
run(
  'a missing file is invalid input',
  [join(out, 'missing.json')],
  2,
  (r) => !r.stderr.includes('    at '),
);

console.log(`cli: ${passed} passed, ${failed} failed`);
if (failed > 0) process.exit(1);
