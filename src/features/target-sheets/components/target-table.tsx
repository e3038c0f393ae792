import type { TargetPoint } from '../../../../shared/schemas/target-sheet.ts';
import { toleranceBand } from '../../../../shared/target-sheet/band.ts';
import { Table, TBody, Td, Th, THead, Tr } from '../../../components/ui/table.tsx';
import type { DisplayUnit } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
/** A piston speed as the team typed it (0.025, not 0.0250), in `unit`. */
export const speedText = (v: number, unit: DisplayUnit) => String(Number(unit.fromSI(v).toPrecision(4)));

/**
 * One direction's reference points, read-only: speed, target, tolerance, floor and the band
 * edges they give (the floor governs where the percentage is narrower; marked with *).
 */
export function TargetTable({ title, points, compact = false }: { title: string; points: readonly TargetPoint[]; compact?: boolean }) {
  const vu = useUnits().damperVelocity;
  const head = compact
    ? ['Speed', 'Target', '±', 'Floor', 'Lower', 'Upper']
    : [`Speed [${vu.symbol}]`, 'Target [N]', '± [%]', 'Floor [N]', 'Lower [N]', 'Upper [N]'];
  const floorMarked = points.some((p) => toleranceBand(p).floorGoverns);
  return (
    <div className="min-w-0">
      <h3 className="mb-1 text-sm font-semibold">
        {title}
        {compact && <span className="ml-2 font-normal text-ink-soft">{vu.symbol} · N · % · N · N · N</span>}
      </h3>
      <Table caption={`${title} targets`}>
        <THead>
          <tr>
            {head.map((h) => (
              <Th key={h} numeric>
                {h}
              </Th>
            ))}
          </tr>
        </THead>
        <TBody>
          {points.map((p) => {
            const b = toleranceBand(p);
            return (
              <Tr key={p.velocity}>
                <Td numeric>{speedText(p.velocity, vu)}</Td>
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
