import { Link } from 'react-router';
import type { RunSummary } from '../../../../shared/schemas/run-record.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Figure } from '../../../components/ui/figure.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table.tsx';
import { formatDateTime } from '../../../lib/format.ts';

/** Saved runs, newest first; a run of an older revision says so. */
export function SavedRunsTable({ workspaceId, runs, canDelete, onDelete, deleting }: { workspaceId: string; runs: RunSummary[]; canDelete: boolean; onDelete: (run: RunSummary) => void; deleting?: string }) {
  return (
    <Table caption="Saved runs">
      <THead>
        <tr>
          <Th>Run</Th>
          <Th numeric>Speed</Th>
          <Th numeric title="Wk-weighted RMS body acceleration; for a single event, the MTVV (largest 1 s running RMS)">Comfort</Th>
          <Th numeric title="Tyre load RMS over static load">Load var.</Th>
          <Th numeric>Lift-off</Th>
          <Th numeric>Body mode</Th>
          <Th>Saved</Th>
          {canDelete && <Th className="w-px" />}
        </tr>
      </THead>
      <TBody>
        {runs.map((run) => (
          <Tr key={run.id}>
            <Td className="py-1.5">
              <Link to={`/w/${workspaceId}/runs/${run.id}`} className="font-medium text-accent hover:underline">
                {run.name}
              </Link>
              <span className="mt-0.5 flex flex-wrap items-center gap-x-1.5 text-xs text-ink-soft">
                <span>
                  {run.setupName} <span className="figures">r{run.revisionNumber}</span>
                </span>
                {run.latestRevision > run.revisionNumber && <Tag tone="signal">setup now at r{run.latestRevision}</Tag>}
                <span className="text-ink-faint">· {run.roadName}</span>
              </span>
            </Td>
            <Td numeric>
              <Figure value={run.speed} unit="kmph" label="speed" />
            </Td>
            <Td numeric>
              {run.headline.lead === 'event' ? (
                <span data-comfort-figure="mtvv" className="whitespace-nowrap">
                  <span className="text-2xs text-ink-faint">MTVV </span>
                  {run.headline.mtvv === undefined ? <span className="text-ink-faint">—</span> : <Figure value={run.headline.mtvv} unit="mps2" label="MTVV" />}
                </span>
              ) : (
                <span data-comfort-figure="aw" className="whitespace-nowrap">
                  <span className="text-2xs text-ink-faint">aw </span>
                  <Figure value={run.headline.bodyAccelWkRms} unit="mps2" label="Wk-weighted RMS" />
                </span>
              )}
            </Td>
            <Td numeric>
              <Figure value={run.headline.tyreLoadRatio} unit="percent" label="tyre load variation" />
            </Td>
            <Td numeric className={run.headline.liftOffFraction > 0 ? '[&_*]:!text-signal-ink' : ''}>
              <Figure value={run.headline.liftOffFraction} unit="percent" label="lift-off share" />
            </Td>
            <Td numeric>
              <Figure value={run.headline.bodyHz} unit="Hz" label="body frequency" />
            </Td>
            <Td className="text-xs whitespace-nowrap text-ink-soft">
              <span className="figures block">{formatDateTime(run.createdAt)}</span>
              {run.createdBy.name}
            </Td>
            {canDelete && (
              <Td>
                <Button size="sm" variant="quiet" busy={deleting === run.id} onClick={() => onDelete(run)} aria-label={`Delete ${run.name}`}>
                  Delete
                </Button>
              </Td>
            )}
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
