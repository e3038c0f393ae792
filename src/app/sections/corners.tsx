import type { SectionModule } from '../sections.ts';

export const section: SectionModule = {
  nav: { label: 'Corners', path: 'corners', order: 10, blurb: 'Corner setups with every revision, grouped into vehicles.' },
  workspaceRoutes: [
    { path: 'corners', lazy: async () => ({ Component: (await import('../routes/corners.tsx')).CornersRoute }) },
    { path: 'corners/:setupId', lazy: async () => ({ Component: (await import('../routes/corner-bench.tsx')).CornerBenchRoute }) },
    { path: 'vehicles/:vehicleId', lazy: async () => ({ Component: (await import('../routes/vehicle.tsx')).VehicleRoute }) },
  ],
  publicRoutes: [{ path: 'shared/:token', lazy: async () => ({ Component: (await import('../routes/shared.tsx')).SharedRoute }) }],
};
