import type { SectionModule } from '../sections.ts';
import { StudiesRoute } from '../routes/studies.tsx';
import { StudyDetailRoute } from '../routes/study-detail.tsx';

export const section: SectionModule = {
  nav: { label: 'Studies', path: 'studies', order: 40, blurb: 'Sweep damping and springs over roads and speeds, weigh comfort against grip, and pick the compromise.' },
  workspaceRoutes: [
    { path: 'studies', element: <StudiesRoute /> },
    { path: 'studies/:studyId', element: <StudyDetailRoute /> },
  ],
};
