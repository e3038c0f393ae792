import { useState } from 'react';
import { scaleDamper, splitDamper } from '../../../../shared/sim/damper-builder.ts';
import { Damper } from '../../../../shared/schemas/setup.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, Input } from '../../../components/ui/field.tsx';
import { formatSig } from '../../../lib/format.ts';

const positive = (text: string, max: number): number | undefined => {
  const x = Number(text.replace(',', '.'));
  return Number.isFinite(x) && x > 0 && x <= max ? x : undefined;
};

/**
 * Whole-damper changes: scale every force by a factor, or re-balance rebound against
 * compression at the same overall damping (the ratio is of the least-squares equivalent
 * coefficients, the figure shown beside the chart).
 */
export function ScaleSplit({ damper, currentSplit, onChange }: { damper: Damper; currentSplit: number; onChange: (d: Damper) => void }) {
  const [factor, setFactor] = useState('1.1');
  const [ratio, setRatio] = useState(() => formatSig(currentSplit, 3));
  const f = positive(factor, 10);
  const r = positive(ratio, 20);
  // the builders keep the schema's shape; parsing re-applies its rules and brands
  const apply = (next: Damper) => onChange(Damper.parse(next));
  return (
    <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
      <div className="flex items-end gap-2">
        <Field label="Scale all forces ×" error={f === undefined ? 'a factor above 0, at most 10' : undefined}>
          <Input inputMode="decimal" className="figures w-24 text-right" value={factor} onChange={(e) => setFactor(e.target.value)} />
        </Field>
        <Button size="md" variant="secondary" disabled={f === undefined} onClick={() => f !== undefined && apply(scaleDamper(damper, f))}>
          Scale
        </Button>
      </div>
      <div className="flex items-end gap-2">
        <Field label={`Rebound ÷ compression (now ${formatSig(currentSplit, 3)})`} error={r === undefined ? 'a ratio above 0, at most 20' : undefined}>
          <Input inputMode="decimal" className="figures w-24 text-right" value={ratio} onChange={(e) => setRatio(e.target.value)} />
        </Field>
        <Button size="md" variant="secondary" disabled={r === undefined} onClick={() => r !== undefined && apply(splitDamper(damper, r))}>
          Re-balance
        </Button>
      </div>
    </div>
  );
}
