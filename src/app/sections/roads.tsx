import type { SectionModule } from '../sections.ts';

export const section: SectionModule = {
  nav: { label: 'Roads', path: 'roads', order: 20, blurb: 'ISO 8608 random roads, events and measured profiles, with their spectra.' },
  workspaceRoutes: [
    { path: 'roads', lazy: async () => ({ Component: (await import('../routes/roads.tsx')).RoadsRoute }) },
    { path: 'roads/:roadId', lazy: async () => ({ Component: (await import('../routes/road-detail.tsx')).RoadDetailRoute }) },
  ],
};
