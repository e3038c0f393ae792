import { useEffect, useRef, useState } from 'react';
import type { Road } from '../../../../shared/schemas/road.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import type { StudyFigureKey } from '../../../../shared/schemas/study.ts';
import { STUDY_MAX_SEEDS } from '../../../../shared/schemas/study.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input } from '../../../components/ui/field.tsx';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table.tsx';
import { formatQuantityText } from '../../../lib/format.ts';
import { useStudyDisplay } from '../model/display.ts';
import { runOverSeeds, type SeedRepeatResult } from '../run/run-over-seeds.ts';

const HEADLINE: StudyFigureKey[] = ['bodyAccelWkRms', 'vdv', 'bodyAccelPeak', 'tyreLoadRatio', 'tyreLoadMin', 'travelRms', 'strokeUsed', 'damperVelocityRms'];

export interface SeedRepeatPanelProps {
  setup: Setup;
  road: Road;
  /** m/s */
  speed: number;
  /** s */
  duration: number;
  settleTime?: number;
  seed?: number;
}

/**
 * The run just made, repeated over N road seeds in the study workers: one random profile is
 * one sample, so the headline figures are given as mean and spread. Only an ISO 8608 road
 * changes with the seed; for any other road the panel says so and offers nothing to run.
 */
export function SeedRepeatPanel({ setup, road, speed, duration, settleTime, seed }: SeedRepeatPanelProps) {
  const { figureLabel, figureText } = useStudyDisplay();
  const [seeds, setSeeds] = useState(10);
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<SeedRepeatResult | null>(null);
  const [error, setError] = useState('');
  const controller = useRef<AbortController | null>(null);
  useEffect(() => () => controller.current?.abort(), []);

  if (road.kind !== 'iso8608') {
    return (
      <p className="text-sm text-ink-soft" data-testid="seed-repeat-none">
        This road is an event or a measured profile: it is the same for every seed, so repeating the run over seeds would give the same figures.
      </p>
    );
  }

  const valid = Number.isInteger(seeds) && seeds >= 2 && seeds <= STUDY_MAX_SEEDS;
  const run = async () => {
    controller.current?.abort();
    const c = new AbortController();
    controller.current = c;
    setBusy(true);
    setError('');
    try {
      const out = await runOverSeeds({ setup, road, speed, duration, settleTime, seed, seeds }, c.signal);
      if (out) setResult(out);
    } catch (e) {
      setError(`The repeat stopped: ${(e as Error).message}`);
    } finally {
      if (controller.current === c) setBusy(false);
    }
  };
  const keys = result ? HEADLINE.filter((k) => result.figures[k] !== undefined) : [];
  // The unit is in the figure's label; cells hold numbers only.
  const withUnit = (k: StudyFigureKey, si: number | undefined) => (si === undefined ? '—' : figureText(k, si));

  return (
    <section aria-label="Over several road seeds" className="space-y-2">
      <div className="flex flex-wrap items-end gap-3">
        <Field label="Road seeds" hint={`2 to ${STUDY_MAX_SEEDS}; seed 1 is this run's`} className="w-40" error={valid ? undefined : `Give a whole number from 2 to ${STUDY_MAX_SEEDS}`}>
          <Input type="number" min={2} max={STUDY_MAX_SEEDS} value={Number.isFinite(seeds) ? seeds : ''} onChange={(e) => setSeeds(e.target.valueAsNumber)} />
        </Field>
        <Button onClick={() => void run()} disabled={!valid} busy={busy}>
          Repeat over {valid ? seeds : 'N'} seeds
        </Button>
        {busy && (
          <Button variant="quiet" onClick={() => controller.current?.abort()}>
            Stop
          </Button>
        )}
      </div>
      <FormError message={error} />
      {result && (
        <div data-testid="seed-repeat-result">
          <p className="mb-1 text-xs text-ink-faint">
            {result.runs.length} runs of {formatQuantityText(duration, 's')} on {result.workers} workers in <span className="figures">{formatQuantityText(result.elapsedMs / 1000, 's')}</span>, with the study runner
            {result.failed > 0 ? `; ${result.failed} failed and are left out` : ''}. Road seeds {result.roadSeeds.slice(0, 4).join(', ')}
            {result.roadSeeds.length > 4 ? ', …' : ''}.
          </p>
          <Table caption="Figures over road seeds">
            <THead>
              <Tr>
                <Th>Figure</Th>
                <Th numeric>Mean</Th>
                <Th numeric>Standard deviation</Th>
                <Th numeric>Least</Th>
                <Th numeric>Greatest</Th>
              </Tr>
            </THead>
            <TBody>
              {keys.map((k) => (
                <Tr key={k}>
                  <Td>{figureLabel(k)}</Td>
                  <Td numeric>{withUnit(k, result.figures[k])}</Td>
                  <Td numeric>{withUnit(k, result.spread[k]?.sd)}</Td>
                  <Td numeric>{withUnit(k, result.spread[k]?.min)}</Td>
                  <Td numeric>{withUnit(k, result.spread[k]?.max)}</Td>
                </Tr>
              ))}
            </TBody>
          </Table>
        </div>
      )}
    </section>
  );
}
