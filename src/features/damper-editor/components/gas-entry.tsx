import { useEffect, useMemo, useState } from 'react';
import { GasCharge } from '../../../../shared/schemas/setup.ts';
import { barToPa, cm3ToM3, m3ToCm3, paToBar } from '../../../../shared/units.ts';
import { staticGasForce } from '../../../../shared/sim/damper-gas.ts';
import { Field, Input, Select } from '../../../components/ui/field.tsx';
import { Caution } from '../../../components/ui/notice.tsx';
import { Figure } from '../../../components/ui/figure.tsx';
import { type DisplayUnit, units } from '../../../lib/format.ts';
import { plainIssue, type Problem } from '../../../lib/plain-issue.ts';
import { cellText } from '../model/draft.ts';

type Mode = 'none' | 'force' | 'pressure';

interface Texts {
  mode: Mode;
  force: string;
  pressureBar: string;
  rodAreaMm2: string;
  stiffens: boolean;
  volumeCm3: string;
  exponent: string;
}

function textsOf(gas: GasCharge | undefined): Texts {
  return {
    mode: !gas ? 'none' : gas.pressure !== undefined ? 'pressure' : 'force',
    force: gas?.force !== undefined ? cellText(gas.force) : '',
    pressureBar: gas?.pressure !== undefined ? cellText(paToBar(gas.pressure)) : '',
    rodAreaMm2: gas?.rodArea !== undefined ? cellText(gas.rodArea * 1e6) : '',
    stiffens: Boolean(gas?.polytropic),
    volumeCm3: gas?.polytropic ? cellText(m3ToCm3(gas.polytropic.volume)) : '',
    exponent: gas?.polytropic ? cellText(gas.polytropic.exponent) : '1.2',
  };
}

const num = (t: string) => (t.trim() === '' ? undefined : Number(t.replace(',', '.')));

/** The texts as a gas charge in SI (possibly invalid; the schema says why). */
function candidate(t: Texts): unknown {
  if (t.mode === 'none') return undefined;
  const area = num(t.rodAreaMm2);
  const rodArea = area === undefined ? undefined : area * 1e-6;
  const polytropic = t.stiffens ? { volume: cm3ToM3(num(t.volumeCm3) ?? Number.NaN), exponent: num(t.exponent) ?? Number.NaN } : undefined;
  if (t.mode === 'force') return { force: num(t.force) ?? Number.NaN, ...(rodArea !== undefined ? { rodArea } : {}), ...(polytropic ? { polytropic } : {}) };
  const bar = num(t.pressureBar);
  return { pressure: bar === undefined ? Number.NaN : barToPa(bar), ...(rodArea !== undefined ? { rodArea } : {}), ...(polytropic ? { polytropic } : {}) };
}

const rodAreaMm2: DisplayUnit = { symbol: 'mm²', fromSI: (si) => si * 1e6, toSI: (shown) => shown * 1e-6 };

/** Field names and units as the gas fields show them. */
const subjects: Record<string, { label: string; unit?: DisplayUnit }> = {
  force: { label: 'Gas rod force', unit: units.N },
  pressure: { label: 'Gas pressure', unit: units.bar },
  rodArea: { label: 'Rod area', unit: rodAreaMm2 },
  'polytropic.volume': { label: 'Gas volume', unit: units.cm3 },
  'polytropic.exponent': { label: 'Gas exponent n' },
};

/**
 * Gas charge of the damper: none, a rod force in N, or a pressure in bar on the rod area, with
 * optional stiffening as the rod enters. Changes are passed up only when they make a valid
 * charge; problems show beside the fields.
 */
export function GasEntry({
  gas,
  readOnly,
  onChange,
  onProblemsChange,
}: {
  gas: GasCharge | undefined;
  readOnly?: boolean;
  onChange: (g: GasCharge | undefined) => void;
  /** What in the gas fields does not make a valid charge yet (it is not passed up until it does). */
  onProblemsChange?: (problems: Problem[]) => void;
}) {
  const [texts, setTexts] = useState<Texts>(() => textsOf(gas));
  const parsed = useMemo(() => {
    const cand = candidate(texts);
    return cand === undefined ? ({ success: true, data: undefined } as const) : GasCharge.safeParse(cand);
  }, [texts]);
  const problems = useMemo<Problem[]>(
    () =>
      parsed.success
        ? []
        : parsed.error.issues.map((i) => {
            const path = i.path.join('.');
            const subject = subjects[path] ?? { label: 'Gas charge' };
            return { path: `damper.gas.${path}`, label: subject.label, message: plainIssue(i, subject) };
          }),
    [parsed],
  );
  useEffect(() => {
    if (!readOnly) onProblemsChange?.(problems);
  }, [problems, readOnly, onProblemsChange]);
  const issue = (key: string) => problems.find((p) => p.path.startsWith(`damper.gas.${key}`))?.message;

  const update = (patch: Partial<Texts>) => {
    const next = { ...texts, ...patch };
    setTexts(next);
    const c = candidate(next);
    if (c === undefined) return onChange(undefined);
    const p = GasCharge.safeParse(c);
    if (p.success) onChange(p.data);
  };

  return (
    <fieldset className="grid gap-2" aria-label="Gas charge" disabled={readOnly}>
      <div className="flex flex-wrap items-end gap-3">
        <Field label="Gas charge">
          <Select value={texts.mode} onChange={(e) => update({ mode: e.target.value as Mode })} className="w-48">
            <option value="none">none</option>
            <option value="force">rod force [N]</option>
            <option value="pressure">pressure × rod area</option>
          </Select>
        </Field>
        {texts.mode === 'force' && (
          <Field label="Rod force [N]" error={issue('force')}>
            <Input inputMode="decimal" className="figures w-28 text-right" value={texts.force} onChange={(e) => update({ force: e.target.value })} />
          </Field>
        )}
        {texts.mode === 'pressure' && (
          <Field label="Pressure [bar]" error={issue('pressure')}>
            <Input inputMode="decimal" className="figures w-28 text-right" value={texts.pressureBar} onChange={(e) => update({ pressureBar: e.target.value })} />
          </Field>
        )}
        {texts.mode !== 'none' && (
          <Field label="Rod area [mm²]" error={issue('rodArea')} hint={texts.mode === 'force' ? 'needed for stiffening' : undefined}>
            <Input inputMode="decimal" className="figures w-28 text-right" value={texts.rodAreaMm2} onChange={(e) => update({ rodAreaMm2: e.target.value })} />
          </Field>
        )}
        {texts.mode !== 'none' && parsed.success && parsed.data && (
          <p className="pb-2 text-sm text-ink-soft">
            static force <Figure value={staticGasForce(parsed.data)} unit="N" label="static gas force" />
          </p>
        )}
      </div>
      {texts.mode !== 'none' && (
        <div className="flex flex-wrap items-end gap-3">
          <label className="flex items-center gap-2 pb-2 text-sm text-ink-soft">
            <input type="checkbox" checked={texts.stiffens} onChange={(e) => update({ stiffens: e.target.checked })} />
            stiffens as the rod enters
          </label>
          {texts.stiffens && (
            <>
              <Field label="Gas volume [cm³]" error={issue('polytropic.volume')}>
                <Input inputMode="decimal" className="figures w-28 text-right" value={texts.volumeCm3} onChange={(e) => update({ volumeCm3: e.target.value })} />
              </Field>
              <Field label="Exponent n" hint="1 isothermal … 1.4 adiabatic" error={issue('polytropic.exponent')}>
                <Input inputMode="decimal" className="figures w-20 text-right" value={texts.exponent} onChange={(e) => update({ exponent: e.target.value })} />
              </Field>
            </>
          )}
        </div>
      )}
      {texts.mode !== 'none' && (
        <Caution>
          Gas-charged dampers hold pressure even when removed from the car: do not open, heat or puncture one, and dispose of it as local rules and the maker’s
          instructions say.
        </Caution>
      )}
    </fieldset>
  );
}
