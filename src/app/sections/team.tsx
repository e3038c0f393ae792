import type { SectionModule } from '../sections.ts';

export const section: SectionModule = {
  nav: { label: 'Team', path: 'team', order: 80, blurb: 'Who works in this workspace, and with which role.' },
  workspaceRoutes: [{ path: 'team', lazy: async () => ({ Component: (await import('../routes/team.tsx')).TeamRoute }) }],
};
