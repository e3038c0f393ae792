import { createContext, useContext } from 'react';

/**
 * What a chart's saved files say about where they came from, set once around a page or a
 * dashboard: `stem` starts every file name (`front-left-r3_iso-C_60kmh`, from
 * `src/lib/export-name.ts`), `context` is the line printed in every image under its title
 * ("Front left r3 · ISO 8608 class C · 60 km/h"); the export date is added to it.
 */
export interface ChartExportInfo {
  stem: string;
  context: string;
}

const ChartExportContext = createContext<ChartExportInfo | null>(null);

export const ChartExportProvider = ChartExportContext.Provider;

export function useChartExport(): ChartExportInfo | null {
  return useContext(ChartExportContext);
}
