import type { SectionModule } from '../sections.ts';

export const section: SectionModule = {
  nav: { label: 'Studies', path: 'studies', order: 40, blurb: 'Sweep damping and springs over roads and speeds, weigh comfort against grip, and pick the compromise.' },
  workspaceRoutes: [
    { path: 'studies', lazy: async () => ({ Component: (await import('../routes/studies.tsx')).StudiesRoute }) },
    { path: 'studies/:studyId', lazy: async () => ({ Component: (await import('../routes/study-detail.tsx')).StudyDetailRoute }) },
  ],
};
