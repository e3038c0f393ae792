import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import type { TargetSheetContent } from '../schemas/target-sheet.ts';
import { parseDynoCsv } from '../dyno/parse-dyno-csv.ts';
import { checkConformity } from './conformity.ts';
import { conformityToCsv, targetSheetToCsv } from './to-csv.ts';

const sheet: TargetSheetContent = {
  compression: [
    { velocity: 0.05, force: 250, tolPct: 10, floorN: 30 },
    { velocity: 0.3, force: 750, tolPct: 10, floorN: 30 },
  ],
  rebound: [
    { velocity: 0.05, force: 600, tolPct: 8, floorN: 30 },
    { velocity: 0.3, force: 1725, tolPct: 8, floorN: 30 },
  ],
  gasForce: 150,
  notes: '',
};

describe('targetSheetToCsv', () => {
  it('writes one row per direction and speed with the band edges, after a # preamble', () => {
    const text = targetSheetToCsv({ ...sheet, number: 'TS-TBMW-2026-0003', setupName: 'Pipit front', setupRevision: 4, status: 'in_review' });
    const lines = text.trimEnd().split('\n');
    expect(lines.slice(0, 4)).toEqual([
      '# damper target sheet TS-TBMW-2026-0003',
      '# setup Pipit front, revision 4',
      '# status in review',
      '# gas force 150 N (not included in the target forces)',
    ]);
    const rows = Papa.parse<string[]>(lines.slice(4).join('\n')).data;
    expect(rows[0]).toEqual(['direction', 'velocity [m/s]', 'target force [N]', 'tolerance [%]', 'floor [N]', 'lower [N]', 'upper [N]']);
    expect(rows[1]).toEqual(['compression', '0.05', '250', '10', '30', '220', '280']); // floor governs: 10 % is 25 N
    expect(rows[4]).toEqual(['rebound', '0.3', '1725', '8', '30', '1587', '1863']);
  });

  it('reads back through the dyno parser as peak points that conform exactly', () => {
    const parsed = parseDynoCsv(targetSheetToCsv(sheet));
    if (!parsed.ok || parsed.kind !== 'peaks') throw new Error('expected peak points');
    const report = checkConformity(sheet, [{ label: 'nominal', peaks: parsed.data }]);
    expect(report.verdict).toBe('pass');
    expect(report.dampers[0].rebound.points.map((p) => p.deviation)).toEqual([0, 0]);
  });

  it('can leave the preamble out', () => {
    expect(targetSheetToCsv(sheet, { preamble: false }).startsWith('direction,')).toBe(true);
  });
});

describe('conformityToCsv', () => {
  it('writes every checked point, blank where not measured', () => {
    const report = checkConformity(sheet, [{ label: 'PF-0144', peaks: { compression: [{ velocity: 0.05, force: 260 }, { velocity: 0.2, force: 600 }], rebound: [] } }]);
    const rows = Papa.parse<string[]>(conformityToCsv(report).trim()).data;
    expect(rows).toHaveLength(5);
    expect(rows[1]).toEqual(['PF-0144', 'compression', '0.05', '250', '220', '280', '260', '10', '4', 'pass', 'within']);
    expect(rows[4].slice(6)).toEqual(['', '', '', 'fail', 'not-measured']);
  });
});
