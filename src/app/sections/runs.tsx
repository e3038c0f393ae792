import type { SectionModule } from '../sections.ts';

export const section: SectionModule = {
  nav: { label: 'Runs', path: 'runs', order: 30, blurb: 'Drive a setup over a road, read its comfort, grip and stroke figures, save and compare runs.' },
  workspaceRoutes: [
    { path: 'runs', lazy: async () => ({ Component: (await import('../routes/runs.tsx')).RunsRoute }) },
    { path: 'runs/:runId', lazy: async () => ({ Component: (await import('../routes/run-detail.tsx')).RunDetailRoute }) },
  ],
};
