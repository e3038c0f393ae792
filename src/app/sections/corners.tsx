import type { SectionModule } from '../sections.ts';
import { CornerBenchRoute } from '../routes/corner-bench.tsx';
import { CornersRoute } from '../routes/corners.tsx';
import { SharedRoute } from '../routes/shared.tsx';
import { VehicleRoute } from '../routes/vehicle.tsx';

export const section: SectionModule = {
  nav: { label: 'Corners', path: 'corners', order: 10, blurb: 'Corner setups with every revision, grouped into vehicles.' },
  workspaceRoutes: [
    { path: 'corners', element: <CornersRoute /> },
    { path: 'corners/:setupId', element: <CornerBenchRoute /> },
    { path: 'vehicles/:vehicleId', element: <VehicleRoute /> },
  ],
  publicRoutes: [{ path: 'shared/:token', element: <SharedRoute /> }],
};
