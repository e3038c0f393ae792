import type { RouteObject } from 'react-router';
import type { Role } from '../../shared/schemas/workspace.ts';

/**
 * Extension point. Each file in `src/app/sections/` exports `section: SectionModule`; the router
 * mounts its routes and the rail lists its nav entry. A feature therefore appears in the app
 * by adding one file, without editing the router or the shell.
 */
export interface NavEntry {
  /** Words in the rail ("Corners"). */
  label: string;
  /** Path under `/w/:workspaceId` the entry opens ("setups"). */
  path: string;
  /** Position in the rail: Corners 10, Roads 20, Runs 30, Compare 35, Studies 40, Target sheets 50, Team 80, Activity 90. */
  order: number;
  /** Hide the entry from roles below this one (the server enforces it regardless). */
  minRole?: Role;
  /** One line for the workspace home page. */
  blurb?: string;
}

export interface SectionModule {
  nav?: NavEntry;
  /** Routes under `/w/:workspaceId`, inside the shell; paths are relative ("setups/:setupId"). */
  workspaceRoutes?: RouteObject[];
  /** Routes inside the shell but outside any workspace ("/account/keys"). */
  signedInRoutes?: RouteObject[];
  /** Routes that need no sign-in (shared read-only links). */
  publicRoutes?: RouteObject[];
}

const modules = import.meta.glob<SectionModule>('./sections/*.tsx', { eager: true, import: 'section' });

export const sections: SectionModule[] = Object.keys(modules)
  .sort()
  .map((key) => modules[key]);

export const navEntries: NavEntry[] = sections.flatMap((s) => (s.nav ? [s.nav] : [])).sort((a, b) => a.order - b.order);
