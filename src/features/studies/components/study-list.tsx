import { Link } from 'react-router';
import { listText } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import type { StudySummary } from '../../../../shared/schemas/study-record.ts';
import { Tag } from '../../../components/ui/tag.tsx';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { savedPointName, type StudyDisplay, useStudyDisplay } from '../model/display.ts';

export const statusWords: Record<StudySummary['status'], { text: string; tone: 'plain' | 'accent' | 'signal' }> = {
  draft: { text: 'not run yet', tone: 'plain' },
  complete: { text: 'complete', tone: 'accent' },
  partial: { text: 'partial (stopped)', tone: 'signal' },
};

/** "rebound scale ×0.700–1.60 (4 steps) by spring rate 24.0–40.0 N/mm (4 steps)". */
export function sweepWords(axes: StudySummary['axes'], d: StudyDisplay): string {
  return axes
    .map((a) => {
      const range = `${d.parameterText(a.parameter, a.from)}–${d.parameterText(a.parameter, a.to)}`;
      const symbol = d.parameterUnit(a.parameter).symbol;
      const shown = a.parameter.endsWith('Scale') ? `×${range}` : symbol ? `${range} ${symbol}` : range;
      return `${d.parameterLabel(a.parameter, false)} ${shown} (${a.steps} steps)`;
    })
    .join(' by ');
}

/** Saved studies of the workspace, most recently changed first. */
export function StudyList({ workspaceId, studies }: { workspaceId: string; studies: StudySummary[] }) {
  const speedUnit = useUnits().speed;
  const d = useStudyDisplay();
  return (
    <Table caption="Studies">
      <THead>
        <tr>
          <Th>Study</Th>
          <Th>Base</Th>
          <Th>Sweep</Th>
          <Th>Roads</Th>
          <Th>State</Th>
          <Th>Best compromise</Th>
          <Th>Changed</Th>
        </tr>
      </THead>
      <TBody>
        {studies.map((s) => {
          const status = statusWords[s.status];
          const verdict = s.results?.best ? savedPointName(d, s.axes, s.results.best) : null;
          return (
            <Tr key={s.id}>
              <Td>
                <Link to={`/w/${workspaceId}/studies/${s.id}`} className="font-medium text-accent hover:underline">
                  {s.name}
                </Link>
              </Td>
              <Td className="whitespace-nowrap">
                {s.base.setupName ?? <span className="text-ink-faint">setup deleted</span>} <span className="figures text-ink-soft">r{s.base.revisionNumber}</span>
              </Td>
              <Td className="text-ink-soft">{sweepWords(s.axes, d)}</Td>
              <Td className="text-ink-soft">
                {s.roadNames.join(', ')}
                {s.speeds.length > 0 && <span className="figures"> · {listText(s.speeds, speedUnit)}</span>}
              </Td>
              <Td>
                <span className="flex flex-wrap gap-1 whitespace-nowrap">
                  <Tag tone={status.tone}>{status.text}</Tag>
                  {s.baseline && <Tag tone="accent">baseline picked</Tag>}
                </span>
              </Td>
              <Td className="text-sm">{verdict ?? <span className="text-ink-faint">—</span>}</Td>
              <Td className="whitespace-nowrap text-ink-soft">{formatDateTime(s.updatedAt)}</Td>
            </Tr>
          );
        })}
      </TBody>
    </Table>
  );
}
