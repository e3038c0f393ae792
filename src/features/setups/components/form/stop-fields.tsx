import { useWatch } from 'react-hook-form';
import type { EndStop } from '../../../../../shared/schemas/setup.ts';
import { units } from '../../../../lib/format.ts';
import { useUnits } from '../../../../lib/units/use-units.tsx';
import type { SetupForm } from '../../model/use-setup-draft.ts';
import { stopCoefficient } from '../../model/setup-units.ts';
import { QuantityRow } from './quantity-row.tsx';
import { ChoiceRow, ListButtons, ToggleRow } from './toggle-row.tsx';

type Which = 'bumpStop' | 'reboundStop';
type LawKind = EndStop['law']['kind'];

const defaults: Record<Which, EndStop> = {
  bumpStop: { clearance: 0.055, law: { kind: 'polynomial', coefficients: [20000, 0, 4e7] } } as EndStop,
  reboundStop: { clearance: 0.075, law: { kind: 'table', points: [[0.005, 1500], [0.01, 5000], [0.02, 20000]] } } as EndStop,
};
const lawDefaults: Record<LawKind, EndStop['law']> = {
  polynomial: defaults.bumpStop.law,
  table: defaults.reboundStop.law,
};
const words: Record<Which, { title: string; travel: string }> = {
  bumpStop: { title: 'Bump stop', travel: 'compression' },
  reboundStop: { title: 'Rebound stop', travel: 'extension' },
};

/** An end stop: present or not, its clearance from static, and its force law (polynomial or table), all at the wheel. */
export function StopFields({ form, which }: { form: SetupForm; which: Which }) {
  const { control, setValue } = form;
  const { length } = useUnits();
  const stop = useWatch({ control, name: which }) as EndStop | undefined;
  const set = (path: string, value: unknown) => setValue(path as never, value as never, { shouldDirty: true, shouldValidate: true });

  return (
    <>
      <ToggleRow label={words[which].title} hint={stop ? `engages in ${words[which].travel}` : 'none'} checked={Boolean(stop)} onChange={(on) => set(which, on ? structuredClone(defaults[which]) : undefined)} />
      {stop && (
        <>
          <QuantityRow control={control} name={`${which}.clearance`} label="Clearance from static" unit={length} />
          <ChoiceRow<LawKind>
            label="Force law"
            value={stop.law.kind}
            options={[
              ['polynomial', 'polynomial in δ'],
              ['table', 'table of points'],
            ]}
            onChange={(kind) => set(`${which}.law`, structuredClone(lawDefaults[kind]))}
          />
          {stop.law.kind === 'polynomial' && (
            <>
              {stop.law.coefficients.map((_, i) => (
                <QuantityRow key={i} control={control} name={`${which}.law.coefficients.${i}`} label={`c${i + 1} (δ${i === 0 ? '' : ['', '²', '³', '⁴', '⁵', '⁶'][i]})`} unit={stopCoefficient(i + 1)} />
              ))}
              <ListButtons
                what="term"
                canAdd={stop.law.coefficients.length < 6}
                canRemove={stop.law.coefficients.length > 1}
                onAdd={() => stop.law.kind === 'polynomial' && set(`${which}.law.coefficients`, [...stop.law.coefficients, 0])}
                onRemove={() => stop.law.kind === 'polynomial' && set(`${which}.law.coefficients`, stop.law.coefficients.slice(0, -1))}
              />
            </>
          )}
          {stop.law.kind === 'table' && (
            <>
              {stop.law.points.map((_, i) => (
                <div key={i}>
                  <QuantityRow control={control} name={`${which}.law.points.${i}.0`} label={`Point ${i + 1} deflection δ`} unit={length} />
                  <QuantityRow control={control} name={`${which}.law.points.${i}.1`} label={`Point ${i + 1} force`} unit={units.N} />
                </div>
              ))}
              <ListButtons
                what="point"
                canAdd={stop.law.points.length < 64}
                canRemove={stop.law.points.length > 1}
                onAdd={() => {
                  if (stop.law.kind !== 'table') return;
                  const last = stop.law.points[stop.law.points.length - 1];
                  set(`${which}.law.points`, [...stop.law.points, [last[0] * 1.5, last[1] * 2]]);
                }}
                onRemove={() => stop.law.kind === 'table' && set(`${which}.law.points`, stop.law.points.slice(0, -1))}
              />
            </>
          )}
        </>
      )}
    </>
  );
}
