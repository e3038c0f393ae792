import type { SectionModule } from '../sections.ts';
import { CompareRoute } from '../routes/compare.tsx';
import { RunDetailRoute } from '../routes/run-detail.tsx';
import { RunsRoute } from '../routes/runs.tsx';

export const section: SectionModule = {
  nav: { label: 'Runs', path: 'runs', order: 30, blurb: 'Drive a setup over a road, read its comfort, grip and stroke figures, save and compare runs.' },
  workspaceRoutes: [
    { path: 'runs', element: <RunsRoute /> },
    { path: 'runs/:runId', element: <RunDetailRoute /> },
    { path: 'compare', element: <CompareRoute /> },
  ],
};
