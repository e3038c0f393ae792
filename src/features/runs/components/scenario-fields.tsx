import { isoClasses } from '../../../../shared/schemas/road.ts';
import { Field, Input, Select } from '../../../components/ui/field.tsx';
import type { RoadListItem } from '../../../../shared/schemas/road-record.ts';
import { fieldsOf, initialValues, inlineKinds, type InlineKind } from '../model/inline-road.ts';
import { SpeedUnit } from '../../../../shared/schemas/unit-preferences.ts';
import { INLINE_ROAD, switchSpeedUnit, type ScenarioDraft, type ScenarioErrors } from '../model/scenario.ts';

export interface ScenarioFieldsProps {
  draft: ScenarioDraft;
  onChange: (draft: ScenarioDraft) => void;
  errors: ScenarioErrors;
  libraryRoads: RoadListItem[] | undefined;
  libraryUnavailable?: boolean;
  /** Seed of the chosen library road, when it is an ISO road (the seed field appears then). */
  librarySeed?: number;
}

/** Road (library or typed here), speed with its unit, duration, and a seed for library ISO roads. */
export function ScenarioFields({ draft, onChange, errors, libraryRoads, libraryUnavailable, librarySeed }: ScenarioFieldsProps) {
  const set = (patch: Partial<ScenarioDraft>) => onChange({ ...draft, ...patch });
  return (
    <>
      <div className="flex flex-wrap items-start gap-x-3 gap-y-2">
        <Field label="Road" error={errors.roadChoice} hint={libraryUnavailable ? 'Road library not available: define the road here.' : undefined} className="min-w-[14rem] flex-[2]">
          <Select value={draft.roadChoice} onChange={(e) => set({ roadChoice: e.target.value })}>
            <option value={INLINE_ROAD}>Define a road here…</option>
            {(libraryRoads ?? []).length > 0 && (
              <optgroup label="Road library">
                {libraryRoads!.map((r) => (
                  <option key={r.id} value={r.id}>
                    {r.name}
                  </option>
                ))}
              </optgroup>
            )}
          </Select>
        </Field>
        <Field label="Speed" error={errors.speed} className="w-48 shrink-0">
          <div className="flex">
            <div className="min-w-0 flex-1">
              <Input inputMode="decimal" className="rounded-r-none" aria-label="Speed value" value={draft.speed} onChange={(e) => set({ speed: e.target.value, exactSpeed: undefined })} />
            </div>
            <div className="w-[6.2rem] shrink-0">
              <Select aria-label="Speed unit" className="rounded-l-none border-l-0" value={draft.speedUnit} onChange={(e) => onChange(switchSpeedUnit(draft, SpeedUnit.parse(e.target.value)))}>
                {SpeedUnit.options.map((u) => (
                  <option key={u} value={u}>
                    {u}
                  </option>
                ))}
              </Select>
            </div>
          </div>
        </Field>
        <Field label="Duration, s" error={errors.duration} className="w-24 shrink-0">
          <Input inputMode="decimal" value={draft.duration} onChange={(e) => set({ duration: e.target.value })} />
        </Field>
        {draft.roadChoice !== INLINE_ROAD && librarySeed !== undefined && (
          <Field label="Seed" error={errors.seed} hint={`blank: the road’s own (${librarySeed})`} className="w-40">
            <Input inputMode="numeric" value={draft.seed} onChange={(e) => set({ seed: e.target.value })} />
          </Field>
        )}
      </div>
      {draft.roadChoice === INLINE_ROAD && (
        <fieldset className="mt-2 flex flex-wrap items-start gap-x-3 gap-y-2 rounded-sm bg-paper-sunk/50 px-2 pt-1 pb-2">
          <legend className="sr-only">Road definition</legend>
          <Field label="Kind" className="w-56">
            <Select value={draft.kind} onChange={(e) => set({ kind: e.target.value as InlineKind, road: initialValues(e.target.value as InlineKind) })}>
              {inlineKinds.map((k) => (
                <option key={k.kind} value={k.kind}>
                  {k.label}
                </option>
              ))}
            </Select>
          </Field>
          {draft.kind === 'iso8608' && (
            <Field label="ISO 8608 class" error={errors.isoClass} className="w-28">
              <Select value={draft.isoClass} onChange={(e) => set({ isoClass: e.target.value })}>
                {isoClasses.map((c) => (
                  <option key={c} value={c}>
                    {c}
                  </option>
                ))}
              </Select>
            </Field>
          )}
          {fieldsOf(draft.kind).map((f) => (
            <Field key={`${draft.kind}-${f.name}`} label={`${f.label}${f.unit ? `, ${f.unit}` : ''}`} error={errors[`road.${f.name}`]} className="w-28">
              <Input inputMode="decimal" value={draft.road[f.name] ?? ''} onChange={(e) => set({ road: { ...draft.road, [f.name]: e.target.value } })} />
            </Field>
          ))}
        </fieldset>
      )}
    </>
  );
}
