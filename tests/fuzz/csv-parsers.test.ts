import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { readCsvRows } from '../../shared/dyno/csv-rows.ts';
import { parseDynoCsv } from '../../shared/dyno/parse-dyno-csv.ts';
import { summariseDyno } from '../../shared/dyno-upload/summarise-dyno.ts';
import { DynoParseResult } from '../../shared/schemas/dyno.ts';
import { parseMeasuredCsv } from '../../shared/sim/roads/measured-csv.ts';
import { parseDriveCsv } from '../../shared/drive/parse-drive-csv.ts';
import { fuzzSeed, fuzzTally } from './helpers/fuzz-record.ts';
import { csvGarbage, dressed, type Dressing, dressings, textOfBytes } from './helpers/csv-text.ts';

// Every CSV reader in shared/ under random, broken and re-dressed text. Properties: never throws;
// a refusal lists at least one problem in words, with a line inside the file when it names one;
// an acceptance holds only finite SI numbers; a BOM, CRLF or CR line ends, comment and blank lines
// and padded cells do not change what a valid file means; a spoiled cell is reported at its line.

const RUNS = Number(process.env.FUZZ_CSV_RUNS ?? 150);
const seed = fuzzSeed();
const tally = fuzzTally('csv-parsers');
afterAll(() => tally.write({ seed }));

const root = join(import.meta.dirname, '../..');
/** The files fuzzed here; a CSV reader added elsewhere fails the first test until it is listed. */
const covered = ['shared/dyno/csv-rows.ts', 'shared/dyno/parse-dyno-csv.ts', 'shared/sim/roads/measured-csv.ts', 'shared/drive/parse-drive-csv.ts'];

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = join(dir, name);
    if (statSync(full).isDirectory()) return name === 'node_modules' ? [] : sourceFiles(full);
    return name.endsWith('.ts') && !name.endsWith('.test.ts') ? [full] : [];
  });
}

const lineCount = (text: string) => text.split(/\r\n|\n|\r/).length;
const finite = (xs: number[]) => xs.every(Number.isFinite);

type Reader = { name: string; read: (text: string) => { ok: boolean; lines: (number | undefined)[]; messages: string[]; numbers: number[] } };

const readers: Reader[] = [
  {
    name: 'readCsvRows',
    read: (text) => {
      const r = readCsvRows(text, 10_000);
      return { ok: r.problems.length === 0, lines: [...r.problems.map((p) => p.line), ...r.rows.map((x) => x.line)], messages: r.problems.map((p) => p.message), numbers: [] };
    },
  },
  {
    name: 'parseDynoCsv',
    read: (text) => {
      const r = parseDynoCsv(text);
      const shape = DynoParseResult.safeParse(r);
      if (!shape.success) throw new Error(`parseDynoCsv returned a value outside its schema: ${shape.error.message.slice(0, 300)}`);
      if (!r.ok) return { ok: false, lines: r.errors.map((e) => e.line), messages: r.errors.map((e) => e.message), numbers: [] };
      const numbers = r.kind === 'peaks' ? [...r.data.compression, ...r.data.rebound].flatMap((p) => [p.velocity, p.force]) : [...r.data.time, ...r.data.displacement, ...r.data.force];
      return { ok: true, lines: [], messages: [], numbers };
    },
  },
  {
    name: 'summariseDyno',
    read: (text) => {
      const r = summariseDyno(text);
      if (!r.ok) return { ok: false, lines: r.errors.map((e) => e.line), messages: r.errors.map((e) => e.message), numbers: [] };
      const p = r.summary.peaks;
      return { ok: true, lines: [], messages: [], numbers: [...p.compression, ...p.rebound].flatMap((x) => [x.velocity, x.force]) };
    },
  },
  {
    name: 'parseMeasuredCsv',
    read: (text) => {
      const r = parseMeasuredCsv(text, { maxRows: 20_000 });
      if (!r.ok) return { ok: false, lines: r.issues.map((i) => (i.path.startsWith('line ') ? Number(i.path.slice(5)) : undefined)), messages: [r.reason], numbers: [] };
      return { ok: true, lines: [], messages: [], numbers: r.profile.points.flat().concat([r.profile.length, r.profile.medianSpacing]) };
    },
  },
  {
    name: 'parseDriveCsv',
    read: (text) => {
      const r = parseDriveCsv(text, 20_000);
      if (!r.ok) return { ok: false, lines: r.errors.map((e) => e.line), messages: r.errors.map((e) => e.message), numbers: [] };
      return { ok: true, lines: [], messages: [], numbers: [r.data.dt, ...r.data.speed, ...Object.values(r.data.channels).flat()] };
    },
  },
];

function checkRead(reader: Reader, text: string): ReturnType<Reader['read']> {
  const out = reader.read(text); // a throw fails the property with the text shrunk
  if (out.ok) {
    if (!finite(out.numbers)) throw new Error(`${reader.name} accepted non-finite numbers`);
  } else if (reader.name !== 'readCsvRows') {
    if (out.messages.length === 0 || out.messages.some((m) => m.trim().length < 5)) throw new Error(`${reader.name} refused without saying why`);
  }
  const max = lineCount(text) + 1;
  for (const line of out.lines) if (line !== undefined && !(Number.isInteger(line) && line >= 0 && line <= max)) throw new Error(`${reader.name} named line ${line} of a ${max - 1}-line text`);
  return out;
}

/** A valid peak file in one of the three peak layouts, numbers as text. */
const peakFile = fc
  .record({
    layout: fc.constantFrom('per-direction', 'direction-column', 'signed'),
    rows: fc.uniqueArray(fc.integer({ min: 1, max: 3000 }), { minLength: 3, maxLength: 25 }),
    gain: fc.double({ min: 0.2, max: 20, noNaN: true }),
  })
  .map(({ layout, rows, gain }) => {
    const speeds = [...rows].sort((a, b) => a - b);
    const f = (v: number, k: number) => (v * gain * k).toFixed(1);
    if (layout === 'per-direction') return ['velocity [mm/s],compression force [N],rebound force [N]', ...speeds.map((v) => `${v},${f(v, 1)},${f(v, 2.2)}`)];
    if (layout === 'direction-column') return ['direction,velocity [mm/s],force [N]', ...speeds.flatMap((v) => [`compression,${v},${f(v, 1)}`, `rebound,${v},${f(v, 2.2)}`])];
    return ['velocity [mm/s],force [N]', ...speeds.flatMap((v) => [`${v},${f(v, 1)}`, `-${v},-${f(v, 2.2)}`])];
  });

/** A valid measured profile: distance rising, elevation in mm. */
const profileFile = fc
  .record({ step: fc.double({ min: 0.01, max: 2, noNaN: true }), n: fc.integer({ min: 4, max: 120 }), amp: fc.double({ min: 0, max: 50, noNaN: true }) })
  .map(({ step, n, amp }) => ['distance [m],elevation [mm]', ...Array.from({ length: n }, (_, i) => `${(i * step).toFixed(4)},${(amp * Math.sin(i / 3)).toFixed(3)}`)]);

const dressing: fc.Arbitrary<Dressing> = fc.subarray([...dressings], { minLength: 1 });

describe('CSV readers', () => {
  it('covers every CSV reader in shared/ and server/', () => {
    const readersFound = [...sourceFiles(join(root, 'shared')), ...sourceFiles(join(root, 'server'))]
      .filter((f) => /Papa\.parse\(|export function parse\w*Csv\(/.test(readFileSync(f, 'utf8')))
      .map((f) => relative(root, f));
    expect(readersFound.filter((f) => !covered.includes(f)), 'CSV readers not fuzzed here: add them to `readers`').toEqual([]);
  });

  describe.each(readers.map((r) => [r.name, r] as const))('%s', (name, reader) => {
    it('never throws on random or broken text, and refuses in words', () => {
      fc.assert(
        fc.property(csvGarbage, (text) => {
          checkRead(reader, text);
          tally.add(`${name} garbage`);
        }),
        { numRuns: RUNS, seed },
      );
    });

    it('reads bytes in any encoding without throwing (UTF-16, Latin-1, invalid UTF-8, binary)', () => {
      fc.assert(
        fc.property(textOfBytes, (text) => {
          checkRead(reader, text);
          tally.add(`${name} encodings`);
        }),
        { numRuns: Math.ceil(RUNS / 2), seed },
      );
    });
  });

  it('dyno peak files mean the same with a BOM, CRLF or CR, comment and blank lines, padded cells', () => {
    fc.assert(
      fc.property(peakFile, dressing, (lines, dress) => {
        const plain = parseDynoCsv(`${lines.join('\n')}\n`);
        expect(plain.ok).toBe(true);
        const other = parseDynoCsv(dressed(lines, dress));
        expect(other.ok, JSON.stringify(dress)).toBe(true);
        if (plain.ok && other.ok) expect(other.data).toEqual(plain.data);
        tally.add('parseDynoCsv dressed');
      }),
      { numRuns: RUNS, seed },
    );
  });

  it('measured profiles mean the same with a BOM, CRLF or CR, comment and blank lines, padded cells', () => {
    fc.assert(
      fc.property(profileFile, dressing, (lines, dress) => {
        const plain = parseMeasuredCsv(`${lines.join('\n')}\n`);
        const other = parseMeasuredCsv(dressed(lines, dress));
        expect(plain.ok).toBe(true);
        expect(other.ok, JSON.stringify(dress)).toBe(true);
        if (plain.ok && other.ok) expect(other.profile.points).toEqual(plain.profile.points);
        tally.add('parseMeasuredCsv dressed');
      }),
      { numRuns: RUNS, seed },
    );
  });

  /** A valid drive log: time rising at a steady rate, speed and body acceleration in their units. */
  const driveFile = fc
    .record({ rate: fc.constantFrom(100, 200, 500), n: fc.integer({ min: 20, max: 200 }), v: fc.double({ min: 1, max: 40, noNaN: true }) })
    .map(({ rate, n, v }) => ['time [s],speed [m/s],body acceleration [m/s^2]', ...Array.from({ length: n }, (_, i) => `${(i / rate).toFixed(4)},${v.toFixed(3)},${Math.sin(i / 5).toFixed(4)}`)]);

  it('drive logs: a spoiled number is reported at its line', () => {
    fc.assert(
      fc.property(driveFile, fc.nat(), fc.constantFrom('abc', '1..2', '--5', '1e999', 'NaN', '0x1F'), (lines, pick, bad) => {
        expect(parseDriveCsv(`${lines.join('\n')}\n`).ok).toBe(true);
        const row = 1 + (pick % (lines.length - 1));
        const cells = lines[row].split(',');
        cells[2] = bad;
        const spoiled = [...lines];
        spoiled[row] = cells.join(',');
        const r = parseDriveCsv(`${spoiled.join('\n')}\n`);
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.errors.map((e) => e.line)).toContain(row + 1);
        tally.add('parseDriveCsv spoiled line');
      }),
      { numRuns: RUNS, seed },
    );
  });

  const spoilers = fc.constantFrom('abc', '1..2', '--5', '1e999', 'NaN', '"', '0x1F', '١٢٣');

  it('dyno peak files: a spoiled number is reported at its line', () => {
    fc.assert(
      fc.property(peakFile, fc.nat(), spoilers, (lines, pick, bad) => {
        const row = 1 + (pick % (lines.length - 1));
        const cells = lines[row].split(',');
        cells[cells.length - 1] = bad;
        const spoiled = [...lines];
        spoiled[row] = cells.join(',');
        const r = parseDynoCsv(`${spoiled.join('\n')}\n`);
        expect(r.ok).toBe(false);
        if (!r.ok && bad !== '"') expect(r.errors.map((e) => e.line)).toContain(row + 1);
        tally.add('parseDynoCsv spoiled line');
      }),
      { numRuns: RUNS, seed },
    );
  });

  it('measured profiles: a spoiled number is reported at its line', () => {
    fc.assert(
      fc.property(profileFile, fc.nat(), spoilers, (lines, pick, bad) => {
        const row = 1 + (pick % (lines.length - 1));
        const spoiled = [...lines];
        spoiled[row] = `${lines[row].split(',')[0]},${bad}`;
        const r = parseMeasuredCsv(`${spoiled.join('\n')}\n`);
        expect(r.ok).toBe(false);
        if (!r.ok && bad !== '"') expect(r.issues.map((i) => i.path)).toContain(`line ${row + 1}`);
        tally.add('parseMeasuredCsv spoiled line');
      }),
      { numRuns: RUNS, seed },
    );
  });
});
