import uPlot from 'uplot';

/**
 * Shared cursor for stacked time charts: charts given the same key move one cursor together and
 * hide/show a series together when its legend entry is clicked.
 */
export const TIME_CURSOR_KEY = 'rw-time';

/** Cursor options that join the synced group `key` (x only; y scales differ between charts). */
export function syncedCursor(key: string = TIME_CURSOR_KEY): uPlot.Cursor {
  return {
    sync: { key, setSeries: true, scales: ['x', null] },
    drag: { x: true, y: false, setScale: true },
  };
}
