import type { DynoDirectionFit } from '../../../../shared/schemas/dyno.ts';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table.tsx';
import { formatSig } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';

/** Round-off left by the solver (1e−13 N) reads as 0, not as a figure. */
const clean = (x: number, scale: number) => (Math.abs(x) < 1e-9 * Math.max(1, Math.abs(scale)) ? 0 : x);

/** How far each measured point sits from the fitted table, in N and in % of the measured force. */
export function ResidualsTable({ direction, fit }: { direction: 'compression' | 'rebound'; fit: DynoDirectionFit }) {
  const vu = useUnits().damperVelocity;
  if (!fit.ok) {
    return (
      <p className="text-sm text-danger" role="alert">
        {direction}: {fit.message}
      </p>
    );
  }
  return (
    <div className="grid gap-1">
      <h4 className="text-sm font-semibold text-ink">{direction === 'compression' ? 'Compression' : 'Rebound'}</h4>
      <Table caption={`${direction === 'compression' ? 'Compression' : 'Rebound'} residuals`}>
        <THead>
          <tr>
            <Th numeric>Velocity [{vu.symbol}]</Th>
            <Th numeric>Measured [N]</Th>
            <Th numeric>Fitted [N]</Th>
            <Th numeric>Residual [N]</Th>
            <Th numeric>Residual [%]</Th>
          </tr>
        </THead>
        <TBody>
          {fit.residuals.map((r, i) => (
            <Tr key={i}>
              <Td numeric>{formatSig(vu.fromSI(r.velocity), 3)}</Td>
              <Td numeric>{formatSig(r.measured, 4)}</Td>
              <Td numeric>{formatSig(r.fitted, 4)}</Td>
              <Td numeric>{formatSig(clean(r.residual, r.measured), 3)}</Td>
              <Td numeric className={r.residualPct !== null && Math.abs(r.residualPct) > 10 ? 'text-signal-ink' : ''}>
                {r.residualPct === null ? '—' : formatSig(clean(r.residualPct, 100), 2)}
              </Td>
            </Tr>
          ))}
        </TBody>
      </Table>
      <p className="text-xs text-ink-faint">
        RMS {formatSig(fit.rmsResidual, 3)} N{fit.rmsResidualPct !== null && ` (${formatSig(fit.rmsResidualPct, 2)} %)`}, largest {formatSig(fit.maxAbsResidual, 3)} N.
        {fit.notes.map((n) => ` ${n}.`)}
      </p>
    </div>
  );
}
