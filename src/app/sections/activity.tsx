import type { SectionModule } from '../sections.ts';
import { ActivityRoute } from '../routes/activity.tsx';

export const section: SectionModule = {
  nav: { label: 'Activity', path: 'activity', order: 90, minRole: 'admin', blurb: 'Every change made here: who, what and when.' },
  workspaceRoutes: [{ path: 'activity', element: <ActivityRoute /> }],
};
