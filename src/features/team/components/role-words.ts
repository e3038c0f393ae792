import type { Role } from '../../../../shared/schemas/workspace.ts';

/** What each role may do, as one sentence, for the role picker, the invite form and the overview. */
export const roleWords: Record<Role, string> = {
  viewer: 'Viewers read everything and change nothing.',
  engineer: 'Engineers build setups, roads, runs and studies.',
  lead: 'Leads do what engineers do, and also choose baselines and approve target sheets.',
  admin: 'Admins do what leads do, and also manage members and roles.',
};

/** "an engineer", "a lead". */
export function withArticle(role: Role): string {
  return `${role === 'admin' || role === 'engineer' ? 'an' : 'a'} ${role}`;
}
