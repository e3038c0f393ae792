import type { SectionModule } from '../sections.ts';

export const section: SectionModule = {
  nav: { label: 'Activity', path: 'activity', order: 90, minRole: 'admin', blurb: 'Every change made here: who, what and when.' },
  workspaceRoutes: [{ path: 'activity', lazy: async () => ({ Component: (await import('../routes/activity.tsx')).ActivityRoute }) }],
};
