import type { UnitPreferences } from '../../../../shared/schemas/unit-preferences.ts';
import { FormError } from '../../../components/ui/field.tsx';
import { kindLabels, unitTable, type QuantityKind } from '../../../lib/units/unit-table.ts';
import { useSaveUnits } from '../api/save-units.ts';

const examples: Record<QuantityKind, string> = {
  damperVelocity: 'damper tables, dyno fits, run charts, sheets',
  rate: 'springs, tyres, studies',
  speed: 'road speeds, live runs',
  length: 'travel, stroke, sag, ride height',
};

/** The person's display units; each choice is saved and applied at once. Stored figures stay SI. */
export function UnitPreferencesForm({ units }: { units: UnitPreferences }) {
  const save = useSaveUnits();
  const shown = save.isPending && save.variables ? save.variables : units;
  const choose = (kind: QuantityKind, unit: string) => save.mutate({ ...shown, [kind]: unit } as UnitPreferences);

  return (
    <div className="flex max-w-2xl flex-col gap-3" aria-label="Units">
      <dl className="grid grid-cols-[minmax(10rem,auto)_auto_1fr] items-center gap-x-4 gap-y-3">
        {(Object.keys(unitTable) as QuantityKind[]).map((kind) => (
          <div key={kind} className="contents">
            <dt id={`units-${kind}`} className="text-sm font-medium text-ink">
              {kindLabels[kind]}
            </dt>
            <dd>
              <div role="radiogroup" aria-labelledby={`units-${kind}`} className="inline-flex rounded-sm border border-rule-strong text-sm">
                {Object.keys(unitTable[kind]).map((unit) => (
                  <button
                    key={unit}
                    type="button"
                    role="radio"
                    aria-checked={shown[kind] === unit}
                    disabled={save.isPending}
                    onClick={() => choose(kind, unit)}
                    className={`px-2.5 py-1 font-mono ${shown[kind] === unit ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-sunk'}`}
                  >
                    {unit}
                  </button>
                ))}
              </div>
            </dd>
            <dd className="text-xs text-ink-faint">{examples[kind]}</dd>
          </div>
        ))}
      </dl>
      <p className="text-xs text-ink-faint">Only the display changes: every stored figure stays in SI units, and exports name the unit in each column header.</p>
      <FormError message={save.isError ? `Not saved: ${save.error.message}` : ''} />
    </div>
  );
}
