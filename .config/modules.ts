/**
 * The public modules, each published as a subpath `headflow/<name>`.
 * tsup builds one entry per name and tests/package.test.ts checks that package.json's
 * "exports" map lists exactly these. Add a module here when it lands.
 */
export const publicModules = [
  'units',
  'fluids',
  'pipes',
  'friction',
  'losses',
  'network',
  'system',
  'pumps',
  'design',
  'select',
  'report',
] as const;
