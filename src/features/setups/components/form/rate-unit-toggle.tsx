import { useEffect, useState } from 'react';
import type { RateUnit } from '../../model/setup-units.ts';

const KEY = 'ridewright.rateUnit';

/** The rate unit the person prefers (N/mm or N/m), remembered in this browser. */
export function useRateUnit(): [RateUnit, (u: RateUnit) => void] {
  const [unit, setUnit] = useState<RateUnit>(() => (typeof localStorage !== 'undefined' && localStorage.getItem(KEY) === 'N/m' ? 'N/m' : 'N/mm'));
  useEffect(() => {
    localStorage.setItem(KEY, unit);
  }, [unit]);
  return [unit, setUnit];
}

export function RateUnitToggle({ value, onChange }: { value: RateUnit; onChange: (u: RateUnit) => void }) {
  return (
    <div role="radiogroup" aria-label="Rates in" className="inline-flex rounded-sm border border-rule-strong text-2xs">
      {(['N/mm', 'N/m'] as const).map((u) => (
        <button
          key={u}
          type="button"
          role="radio"
          aria-checked={value === u}
          onClick={() => onChange(u)}
          className={`px-1.5 py-px font-mono ${value === u ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-sunk'}`}
        >
          {u}
        </button>
      ))}
    </div>
  );
}
