import type { SectionModule } from '../sections.ts';
import { SheetDetailRoute } from '../routes/sheet-detail.tsx';
import { SheetPrintRoute } from '../routes/sheet-print.tsx';
import { SheetsRoute } from '../routes/sheets.tsx';

export const section: SectionModule = {
  nav: { label: 'Target sheets', path: 'sheets', order: 50, blurb: 'Damper targets with tolerance bands, released by a lead and checked against dyno measurements.' },
  workspaceRoutes: [
    { path: 'sheets', element: <SheetsRoute /> },
    { path: 'sheets/:sheetId', element: <SheetDetailRoute /> },
    { path: 'sheets/:sheetId/print', element: <SheetPrintRoute /> },
  ],
};
