import { useState, type FormEvent } from 'react';
import { RoadName } from '../../../../shared/schemas/road-record.ts';
import { Road, type RoadKind } from '../../../../shared/schemas/road.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import type { ApiError } from '../../../lib/api-client.ts';
import { candidateOf, defaultRoads, roadFields, textsOf } from '../model/road-fields.ts';

export interface RoadEditorProps {
  kind: RoadKind;
  /** The road being changed; leave out for a new road of `kind`. */
  initial?: { name: string; definition: Road };
  submitLabel: string;
  busy?: boolean;
  error?: ApiError | null;
  readOnly?: boolean;
  onSubmit: (name: string, definition: Road) => void;
  /** Called with every valid draft, so the page can preview it before it is saved. */
  onDraft?: (definition: Road | null) => void;
}

/**
 * The fields of one road kind in the units engineers use (heights in mm, lengths in m), checked
 * with the shared road schema; problems show beside their fields. A measured road's points are
 * kept as uploaded: only its detrending and resampling step are edited here.
 */
export function RoadEditor({ kind, initial, submitLabel, busy, error, readOnly, onSubmit, onDraft }: RoadEditorProps) {
  const [name, setName] = useState(initial?.name ?? '');
  const [texts, setTexts] = useState<Record<string, string>>(() => (initial ? textsOf(initial.definition) : kind === 'measured' ? {} : { ...defaultRoads[kind] }));
  const [touched, setTouched] = useState(false);
  const keep = initial?.definition.kind === 'measured' ? { points: initial.definition.points } : {};
  const parsed = Road.safeParse(candidateOf(kind, texts, keep as never));
  const nameOk = RoadName.safeParse(name);
  const fieldError = (key: string) => {
    const local = parsed.success ? undefined : parsed.error.issues.find((i) => i.path[0] === key)?.message.replace(/expected number, received NaN/, 'enter a number');
    return local ?? error?.fieldMessage(`definition.${key}`);
  };

  const change = (key: string, value: string) => {
    const next = { ...texts, [key]: value };
    setTexts(next);
    const p = Road.safeParse(candidateOf(kind, next, keep as never));
    onDraft?.(p.success ? p.data : null);
  };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setTouched(true);
    if (parsed.success && nameOk.success) onSubmit(nameOk.data, parsed.data);
  };

  const general = !parsed.success ? parsed.error.issues.filter((i) => i.path.length === 0 || !roadFields[kind].some((f) => f.key === i.path[0])) : [];
  return (
    <form onSubmit={submit} className="grid gap-3" aria-label={`${submitLabel}: road fields`} noValidate>
      <fieldset disabled={readOnly} className="grid gap-3">
        <Field label="Name" error={touched && !nameOk.success ? nameOk.error.issues[0]?.message : error?.fieldMessage('name')}>
          <Input value={name} onChange={(e) => setName(e.target.value)} maxLength={120} />
        </Field>
        <div className="grid gap-3 sm:grid-cols-2">
          {roadFields[kind].map((spec) => (
            <Field key={spec.key} label={`${spec.label}${spec.unit ? ` [${spec.unit}]` : ''}`} hint={spec.hint} error={fieldError(spec.key)}>
              {spec.options ? (
                <Select value={texts[spec.key] ?? ''} onChange={(e) => change(spec.key, e.target.value)}>
                  {spec.optional && <option value="">default</option>}
                  {spec.options.map((o) => (
                    <option key={o} value={o}>
                      {o}
                    </option>
                  ))}
                </Select>
              ) : (
                <Input inputMode="decimal" className="figures text-right" value={texts[spec.key] ?? ''} onChange={(e) => change(spec.key, e.target.value)} />
              )}
            </Field>
          ))}
        </div>
      </fieldset>
      {general.length > 0 && <FormError message={general.map((i) => i.message).join('; ')} />}
      {error && !error.fields.length && <FormError message={error.message} />}
      {!readOnly && (
        <div>
          <Button type="submit" variant="primary" busy={busy} disabled={!parsed.success}>
            {submitLabel}
          </Button>
        </div>
      )}
    </form>
  );
}
