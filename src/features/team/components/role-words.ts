import type { Role } from '../../../../shared/schemas/workspace.ts';

/** What each role may do, in one line, for the role picker and the team page. */
export const roleWords: Record<Role, string> = {
  viewer: 'reads everything, changes nothing',
  engineer: 'builds setups, roads, runs and studies',
  lead: 'as engineer, plus baselines and target-sheet release',
  admin: 'as lead, plus members and roles',
};
