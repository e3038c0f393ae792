import { describe, expect, it } from 'vitest';
import { exportFileName, exportStem, safeWords } from './export-name.ts';

const isoC = { kind: 'iso8608' as const, class: 'C' as const, seed: 7, length: 250 };

describe('export file names', () => {
  it('name setup, revision, road, speed and what the file holds', () => {
    const stem = exportStem({ setupName: 'Front left', revision: 3, road: isoC, speed: 60 / 3.6 });
    expect(stem).toBe('front-left-r3_iso-C_60kmh');
    expect(exportFileName(stem, 'body accel', 'csv')).toBe('front-left-r3_iso-C_60kmh_body-accel.csv');
    expect(exportFileName(stem, 'bodyAccel', 'png')).toBe('front-left-r3_iso-C_60kmh_bodyaccel.png');
  });

  it('keep only safe characters whatever the names hold', () => {
    const stem = exportStem({ setupName: 'Pipit “front” / Ünterbau: <r>?*', revision: 12, road: { kind: 'bump', name: 'Kerb at 5 m; café', height: 0.05, length: 0.5, at: 5 }, speed: 8.33 });
    const name = exportFileName(stem, 'Travel (+ compression) [mm]', 'csv');
    expect(name).toMatch(/^[A-Za-z0-9_-]+\.csv$/);
    expect(name).toBe('pipit-front-unterbau-r-r12_kerb-at-5-m-cafe_30kmh_travel-compression-mm.csv');
  });

  it('name a road without a name by its kind, and fall back when a name has no safe letter', () => {
    expect(exportStem({ setupName: '«»', road: { kind: 'sine', amplitude: 0.01, wavelength: 5 }, speed: 10 })).toBe('setup_sine_36kmh');
    expect(exportFileName('', '***', 'png')).toBe('export.png');
  });

  it('keep names short', () => {
    expect(safeWords('a'.repeat(200)).length).toBeLessThanOrEqual(60);
  });
});
