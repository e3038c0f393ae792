import type { SectionModule } from '../sections.ts';

export const section: SectionModule = {
  nav: { label: 'Compare', path: 'compare', order: 35, blurb: 'Put saved runs, setups or roads side by side: every figure, the difference trace and which is better by more than the stated margin.' },
  workspaceRoutes: [{ path: 'compare', lazy: async () => ({ Component: (await import('../routes/compare.tsx')).CompareRoute }) }],
};
