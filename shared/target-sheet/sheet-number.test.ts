import { describe, expect, it } from 'vitest';
import { formatSheetNumber, nextSheetNumber, parseSheetNumber, workspaceShortCode } from './sheet-number.ts';

describe('sheet numbers', () => {
  it.each([
    ['Tallis & Brume Motor Works', 'TBMW'],
    ['Chassis', 'CHA'],
    ['the Ride Team of Brume', 'RTB'],
    ['Équipe Châssis 2', 'EC2'],
    ['!!!', 'WS'],
  ])('short code of %s is %s', (name, code) => {
    expect(workspaceShortCode(name)).toBe(code);
  });

  it('formats and parses back', () => {
    const n = formatSheetNumber({ code: 'TBMW', year: 2026, sequence: 7 });
    expect(n).toBe('TS-TBMW-2026-0007');
    expect(parseSheetNumber(n)).toEqual({ code: 'TBMW', year: 2026, sequence: 7 });
    expect(parseSheetNumber('TS-tbmw-2026-0007')).toBeUndefined();
  });

  it('continues the sequence per code and year, restarting in a new year', () => {
    const issued = ['TS-TBMW-2026-0001', 'TS-TBMW-2026-0012', 'TS-TBMW-2025-0040', 'TS-RTB-2026-0099', 'junk'];
    expect(nextSheetNumber('TBMW', 2026, issued)).toBe('TS-TBMW-2026-0013');
    expect(nextSheetNumber('TBMW', 2027, issued)).toBe('TS-TBMW-2027-0001');
    expect(nextSheetNumber('TBMW', 2026, ['TS-TBMW-2026-9999'])).toBe('TS-TBMW-2026-10000');
  });
});
