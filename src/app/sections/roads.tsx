import type { SectionModule } from '../sections.ts';
import { RoadDetailRoute } from '../routes/road-detail.tsx';
import { RoadsRoute } from '../routes/roads.tsx';

export const section: SectionModule = {
  nav: { label: 'Roads', path: 'roads', order: 20, blurb: 'ISO 8608 random roads, events and measured profiles, with their spectra.' },
  workspaceRoutes: [
    { path: 'roads', element: <RoadsRoute /> },
    { path: 'roads/:roadId', element: <RoadDetailRoute /> },
  ],
};
