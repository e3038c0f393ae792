import type { ConformityRecordDetail, DamperCheck } from '../../../../shared/schemas/target-sheet.ts';
import { Table, TBody, Td, Th, THead, Tr } from '../../../components/ui/table.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { checkCsvHref } from '../api/get-checks.ts';
import { statusWords } from './status-tag.tsx';
import { speedText } from './target-table.tsx';
import { VerdictMark } from './verdict-mark.tsx';

const r1 = (v: number) => (Math.round(v * 10) / 10).toString().replace('-', '\u2212');
const signed = (v: number | null, unit: string, digits = 1) => (v === null ? '—' : `${v > 0 ? '+' : v < 0 ? '\u2212' : ''}${Math.abs(v).toFixed(digits)} ${unit}`);
const worst = (d: DamperCheck) =>
  [...d.compression.points, ...d.rebound.points].reduce<number | null>((m, p) => (p.deviationPct === null ? m : m === null || Math.abs(p.deviationPct) > Math.abs(m) ? p.deviationPct : m), null);

/** Every point of one damper: band, measured force, deviation in N and %, pass or fail. */
function DamperDetail({ damper }: { damper: DamperCheck }) {
  const vu = useUnits().damperVelocity;
  return (
    <Table caption={`Points of ${damper.label}`}>
      <THead>
        <tr>
          <Th>Direction</Th>
          <Th numeric>Speed [{vu.symbol}]</Th>
          <Th numeric>Target [N]</Th>
          <Th numeric>Band [N]</Th>
          <Th numeric>Measured [N]</Th>
          <Th numeric>Deviation</Th>
          <Th numeric>Deviation [%]</Th>
          <Th>Result</Th>
        </tr>
      </THead>
      <TBody>
        {(['compression', 'rebound'] as const).flatMap((dir) =>
          damper[dir].points.map((p) => (
            <Tr key={`${dir}-${p.velocity}`} className={p.pass ? '' : 'bg-danger-wash/50'}>
              <Td>{dir}</Td>
              <Td numeric>{speedText(p.velocity, vu)}</Td>
              <Td numeric>{r1(p.target)}</Td>
              <Td numeric>
                {r1(p.lower)} … {r1(p.upper)}
              </Td>
              <Td numeric>{p.measured === null ? '—' : r1(p.measured)}</Td>
              <Td numeric>{signed(p.deviation, 'N')}</Td>
              <Td numeric>{signed(p.deviationPct, '%')}</Td>
              <Td>
                <VerdictMark pass={p.pass} verdict={p.verdict} />
              </Td>
            </Tr>
          )),
        )}
      </TBody>
    </Table>
  );
}

/**
 * One stored check: the overall verdict, a line per damper (per direction and overall, with the
 * largest deviation), and every point of every damper on demand.
 */
export function CheckResults({ check, workspaceId }: { check: ConformityRecordDetail; workspaceId: string }) {
  const { report } = check;
  const count = report.dampers.length;
  return (
    <article aria-label={`Dyno check of ${formatDateTime(check.createdAt)}`} className="space-y-3">
      <header className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h3 className="text-base font-semibold">
          <VerdictMark pass={report.verdict === 'pass'} compact />{' '}
          <span className="font-normal text-ink-soft">
            {report.passed} of {count} damper{count === 1 ? '' : 's'} inside every band
          </span>
        </h3>
        <span className="text-xs text-ink-faint">
          {check.createdBy.name}, {formatDateTime(check.createdAt)} · sheet was {statusWords[check.sheetStatus].toLowerCase()} · {check.fileNames.join(', ')}
        </span>
        <a className="text-sm text-accent underline-offset-2 hover:underline" href={checkCsvHref(workspaceId, check.sheetId, check.id)} download>
          Download CSV
        </a>
      </header>
      <Table caption="Verdict per damper">
        <THead>
          <tr>
            <Th>Damper</Th>
            <Th>Compression</Th>
            <Th>Rebound</Th>
            <Th numeric>Largest deviation</Th>
            <Th>Verdict</Th>
          </tr>
        </THead>
        <TBody>
          {report.dampers.map((d) => (
            <Tr key={d.label} className={d.pass ? '' : 'bg-danger-wash/50'}>
              <Td className="font-medium">{d.label}</Td>
              <Td>
                <VerdictMark pass={d.compression.pass} compact />
              </Td>
              <Td>
                <VerdictMark pass={d.rebound.pass} compact />
              </Td>
              <Td numeric>{signed(worst(d), '%')}</Td>
              <Td>
                <VerdictMark pass={d.pass} compact />
              </Td>
            </Tr>
          ))}
        </TBody>
      </Table>
      {report.dampers.map((d) => (
        <details key={d.label} className="group" open={!d.pass && count <= 2}>
          <summary className="cursor-pointer text-sm text-accent">Every point of {d.label}</summary>
          <div className="mt-2">
            <DamperDetail damper={d} />
          </div>
        </details>
      ))}
      {check.measured.some((m) => m.warnings.length > 0) && (
        <ul className="text-xs text-signal-ink" aria-label="Warnings from the files">
          {check.measured.flatMap((m) => m.warnings.map((w, i) => <li key={`${m.label}-${i}`}>{`${m.label} (${m.fileName}), ${w}`}</li>))}
        </ul>
      )}
      <p className="text-xs text-ink-faint">{report.method}</p>
    </article>
  );
}
