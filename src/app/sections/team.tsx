import type { SectionModule } from '../sections.ts';
import { TeamRoute } from '../routes/team.tsx';

export const section: SectionModule = {
  nav: { label: 'Team', path: 'team', order: 80, blurb: 'Who works in this workspace, and with which role.' },
  workspaceRoutes: [{ path: 'team', element: <TeamRoute /> }],
};
