import type { TargetPoint } from '../../../../shared/schemas/target-sheet.ts';
import { toleranceBand } from '../../../../shared/target-sheet/band.ts';
import { Table, TBody, Td, Th, THead, Tr } from '../../../components/ui/table.tsx';
import { formatSig } from '../../../lib/format.ts';

const n = (v: number, digits = 4) => formatSig(v, digits);

/**
 * One direction's reference points, read-only: speed, target, tolerance, floor and the band
 * edges they give (the floor governs where the percentage is narrower; marked with *).
 */
export function TargetTable({ title, points }: { title: string; points: readonly TargetPoint[] }) {
  const floorMarked = points.some((p) => toleranceBand(p).floorGoverns);
  return (
    <div className="min-w-0">
      <h3 className="mb-1 text-sm font-semibold">{title}</h3>
      <Table caption={`${title} targets`}>
        <THead>
          <tr>
            <Th numeric>Speed [m/s]</Th>
            <Th numeric>Target [N]</Th>
            <Th numeric>± [%]</Th>
            <Th numeric>Floor [N]</Th>
            <Th numeric>Lower [N]</Th>
            <Th numeric>Upper [N]</Th>
          </tr>
        </THead>
        <TBody>
          {points.map((p) => {
            const b = toleranceBand(p);
            return (
              <Tr key={p.velocity}>
                <Td numeric>{n(p.velocity, 3)}</Td>
                <Td numeric>{Math.round(p.force * 10) / 10}</Td>
                <Td numeric>{p.tolPct}</Td>
                <Td numeric>
                  {p.floorN}
                  {b.floorGoverns && <span title="The floor sets the band here">*</span>}
                </Td>
                <Td numeric>{Math.round(b.lower * 10) / 10}</Td>
                <Td numeric>{Math.round(b.upper * 10) / 10}</Td>
              </Tr>
            );
          })}
        </TBody>
      </Table>
      {floorMarked && <p className="mt-1 text-xs text-ink-faint">* the floor, not the percentage, sets the band at this speed.</p>}
    </div>
  );
}
