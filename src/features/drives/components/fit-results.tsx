import type { DriveFitOutcome } from '../../../../shared/drive/fit-drive.ts';
import { GOOD_FIT } from '../../../../shared/drive/fit-drive.ts';
import { Notice } from '../../../components/ui/notice.tsx';
import { Table, TBody, Td, Th, THead, Tr } from '../../../components/ui/table.tsx';
import { formatSig } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { channelDisplay } from '../model/channel-display.ts';

type Fitted = Extract<DriveFitOutcome, { ok: true }>;

/** The verdict, the fitted parameters with their bounds, and the figures per signal. */
export function FitResults({ fit }: { fit: Fitted }) {
  const units = useUnits();
  const shown = (unit: string, si: number, digits = 4) => (unit === 'N/m' ? `${formatSig(units.rate.fromSI(si), digits)} ${units.rate.symbol}` : unit === 'kg' ? `${formatSig(si, digits)} kg` : `${formatSig(si, Math.min(digits, 3))}×`);
  return (
    <div className="grid gap-3">
      {fit.verdict.good ? (
        <Notice tone="ok" title="The model follows this drive">
          Every signal is within {GOOD_FIT.maxNormalisedError * 100} % normalised error and above {GOOD_FIT.minCoherence} mean coherence over 0.5–20 Hz.
        </Notice>
      ) : (
        <Notice tone="danger" title="Poor fit: check the road and the signals before using these values">
          <ul className="list-disc pl-5">
            {fit.verdict.reasons.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        </Notice>
      )}
      <div className="grid gap-4 2xl:grid-cols-2">
        <Table caption="Fitted parameters (± the 95 % interval from the Jacobian at the optimum)">
          <THead>
            <Tr>
              <Th>Parameter</Th>
              <Th numeric>Start</Th>
              <Th numeric>Fitted</Th>
              <Th numeric>± 95 %</Th>
              <Th numeric>Change</Th>
            </Tr>
          </THead>
          <TBody>
            {fit.parameters.map((p) => (
              <Tr key={p.key}>
                <Td>{p.label}</Td>
                <Td numeric className="whitespace-nowrap">{shown(p.unit, p.start)}</Td>
                <Td numeric className="whitespace-nowrap">{shown(p.unit, p.value)}</Td>
                <Td numeric className="whitespace-nowrap">{p.halfWidth === null ? 'not identifiable' : shown(p.unit, p.halfWidth, 2)}</Td>
                <Td numeric className="whitespace-nowrap">{`${p.value >= p.start ? '+' : '−'}${formatSig(Math.abs(p.value / p.start - 1) * 100, 2)} %`}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
        <Table caption="Agreement per signal">
          <THead>
            <Tr>
              <Th>Signal</Th>
              <Th numeric>Normalised error, start</Th>
              <Th numeric>fitted</Th>
              <Th numeric>Coherence 0.5–20 Hz</Th>
            </Tr>
          </THead>
          <TBody>
            {fit.channels.map((c) => (
              <Tr key={c.channel}>
                <Td>{channelDisplay(c.channel, units).label}</Td>
                <Td numeric className="whitespace-nowrap">{(c.startError * 100).toFixed(1)} %</Td>
                <Td numeric className="whitespace-nowrap">{(c.error * 100).toFixed(1)} %</Td>
                <Td numeric className="whitespace-nowrap">{c.coherence.toFixed(2)}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      </div>
      <p className="text-2xs text-ink-faint">
        Road: {fit.roadMethod}. {fit.iterations} iterations, {fit.simulations} simulations of the drive, {(fit.elapsedMs / 1000).toFixed(1)} s. Normalised error: rms(measured − model) / rms(measured),
        means removed. The bounds reflect the noise in this drive (residual lag-1 correlation {fit.residualCorrelation.toFixed(2)} taken into account), not what the model leaves out.
      </p>
    </div>
  );
}
