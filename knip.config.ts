// knip finds unused files, exports and dependencies; `npm run lint` runs it.
export default {
  entry: [
    'server/jobs/heavy-worker.mjs',
    'server/jobs/heavy-tasks.ts',
    'server/fleet/chunk-thread.mjs',
    'server/fleet/chunk-task.ts',
    'bench/sweep-worker.ts',
    'migrations/*.ts',
    'workers/*.ts',
    // reached only through the browser build's alias for 'zod' (vite.config.ts)
    'shared/zod-browser.ts',
    'tests/browser/bench-*.ts',
    'tests/browser/helpers/serve-built-client.ts',
  ],
  project: ['src/**/*.{ts,tsx,css}', 'server/**/*.{ts,mjs}', 'shared/**/*.ts', 'workers/**/*.ts', 'migrations/**/*.ts', 'cli/**/*.ts', 'bench/**/*.ts', 'tests/**/*.ts'],
  ignore: ['tests/lint/fixtures/**'],
  // Debian's package, started by the fleet tests and bench:cluster (server/bench/fleet-processes.ts)
  ignoreBinaries: ['redis-server'],
  // pinned for the drive-fitting work of issue 15's other half, not yet imported on this branch
  ignoreDependencies: ['ml-levenberg-marquardt'],
  ignoreExportsUsedInFile: true,
  // Stylesheets import the fonts and Tailwind: read their @import lines as imports.
  compilers: {
    css: (text: string) => [...text.matchAll(/(?<=@)import[^;]+/g)].join('\n'),
  },
};
