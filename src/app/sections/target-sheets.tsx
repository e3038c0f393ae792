import type { SectionModule } from '../sections.ts';

export const section: SectionModule = {
  nav: { label: 'Target sheets', path: 'sheets', order: 50, blurb: 'Damper targets with tolerance bands, released by a lead and checked against dyno measurements.' },
  workspaceRoutes: [
    { path: 'sheets', lazy: async () => ({ Component: (await import('../routes/sheets.tsx')).SheetsRoute }) },
    { path: 'sheets/:sheetId', lazy: async () => ({ Component: (await import('../routes/sheet-detail.tsx')).SheetDetailRoute }) },
    { path: 'sheets/:sheetId/print', lazy: async () => ({ Component: (await import('../routes/sheet-print.tsx')).SheetPrintRoute }) },
  ],
};
