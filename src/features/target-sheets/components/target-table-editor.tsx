import { toNestErrors } from '@hookform/resolvers';
import { useMemo, useState } from 'react';
import { type Control, type FieldErrors, type Path, type Resolver, type UseFormRegister, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { TargetSheetContent, type TargetPoint } from '../../../../shared/schemas/target-sheet.ts';
import { sheetCautions } from '../../../../shared/target-sheet/cautions.ts';
import { toleranceBand } from '../../../../shared/target-sheet/band.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Textarea } from '../../../components/ui/field.tsx';
import { Caution } from '../../../components/ui/notice.tsx';
import { Table, TBody, Td, Th, THead, Tr } from '../../../components/ui/table.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import type { DisplayUnit } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { nextSpeedShown, sheetContentShown, sheetContentToSI, sheetIssueMessage } from '../model/sheet-units.ts';

type Direction = 'compression' | 'rebound';
const cell = 'h-7 px-1.5 text-sm figures text-right';

function BandCell({ control, direction, index }: { control: Control<TargetSheetContent>; direction: Direction; index: number }) {
  const p = useWatch({ control, name: `${direction}.${index}` }) as TargetPoint | undefined;
  if (!p || ![p.force, p.tolPct, p.floorN].every(Number.isFinite)) return <span className="text-ink-faint">—</span>;
  const b = toleranceBand(p);
  return (
    <span className="figures whitespace-nowrap text-ink-soft">
      {Math.round(b.lower)} … {Math.round(b.upper)}
      {b.floorGoverns && <span title="The floor sets the band here">*</span>}
    </span>
  );
}

function messagesOf(errors: FieldErrors<TargetSheetContent>, direction: Direction): string[] {
  const list = errors[direction];
  const out: string[] = [];
  if (list?.message) out.push(list.message);
  if (Array.isArray(list)) {
    list.forEach((row, i) => {
      if (!row) return;
      // the editor's own messages name their point; the server's are given one
      for (const [field, e] of Object.entries(row)) if (e && typeof e === 'object' && 'message' in e && e.message) out.push(/ point \d+: /.test(String(e.message)) ? String(e.message) : `point ${i + 1}, ${field}: ${String(e.message)}`);
    });
  }
  return out;
}

function DirectionEditor({
  direction,
  control,
  register,
  errors,
  speedUnit,
}: {
  direction: Direction;
  control: Control<TargetSheetContent>;
  register: UseFormRegister<TargetSheetContent>;
  errors: FieldErrors<TargetSheetContent>;
  speedUnit: DisplayUnit;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: direction });
  const title = direction === 'compression' ? 'Compression' : 'Rebound';
  const problems = messagesOf(errors, direction);
  const bad = (i: number, f: keyof TargetPoint) => Boolean(errors[direction]?.[i]?.[f]);
  const num = (i: number, f: keyof TargetPoint, label: string, step: string) => (
    <input
      type="number"
      step={step}
      aria-label={`${title} ${label}, point ${i + 1}`}
      aria-invalid={bad(i, f) || undefined}
      className={`${cell} w-full min-w-16 rounded border bg-paper-raised ${bad(i, f) ? 'border-danger' : 'border-rule-strong'}`}
      {...register(`${direction}.${i}.${f}` as Path<TargetSheetContent>, { valueAsNumber: true })}
    />
  );
  const last = useWatch({ control, name: direction });
  return (
    <div className="min-w-0">
      <h3 className="mb-1 text-sm font-semibold">{title}</h3>
      <Table caption={`${title} targets (editable)`}>
        <THead>
          <tr>
            <Th numeric>Speed [{speedUnit.symbol}]</Th>
            <Th numeric>Target [N]</Th>
            <Th numeric>± [%]</Th>
            <Th numeric>Floor [N]</Th>
            <Th numeric>Band [N]</Th>
            <Th>
              <span className="sr-only">Remove</span>
            </Th>
          </tr>
        </THead>
        <TBody>
          {fields.map((f, i) => (
            <Tr key={f.id}>
              <Td className="px-1">{num(i, 'velocity', 'speed', 'any')}</Td>
              <Td className="px-1">{num(i, 'force', 'target force', 'any')}</Td>
              <Td className="px-1">{num(i, 'tolPct', 'tolerance percent', 'any')}</Td>
              <Td className="px-1">{num(i, 'floorN', 'floor', 'any')}</Td>
              <Td numeric>
                <BandCell control={control} direction={direction} index={i} />
              </Td>
              <Td className="px-1">
                <Button variant="quiet" size="sm" aria-label={`Remove ${title.toLowerCase()} point ${i + 1}`} disabled={fields.length <= 1} onClick={() => remove(i)}>
                  ✕
                </Button>
              </Td>
            </Tr>
          ))}
        </TBody>
      </Table>
      {problems.length > 0 && (
        <ul role="alert" className="mt-1 list-inside list-disc text-sm text-danger">
          {problems.map((m) => (
            <li key={m}>{m}</li>
          ))}
        </ul>
      )}
      <Button
        size="sm"
        variant="quiet"
        className="mt-1"
        onClick={() => {
          const tail = last?.[last.length - 1];
          append({ velocity: nextSpeedShown(tail?.velocity, speedUnit), force: tail?.force ?? 0, tolPct: tail?.tolPct ?? 10, floorN: tail?.floorN ?? 20 });
        }}
      >
        Add a {title.toLowerCase()} point
      </Button>
    </div>
  );
}

export interface TargetTableEditorProps {
  initial: TargetSheetContent;
  saving: boolean;
  onSave: (content: TargetSheetContent) => Promise<unknown>;
  /** True for a sent-back sheet: saving reopens it as a draft. */
  reopens?: boolean;
}

/**
 * The editable target table: per direction the reference speeds, forces, ± % and floor of every
 * point (the band they give shown live), plus the gas force and notes. Speeds are typed in the
 * person's damper-velocity unit and sent in m/s. Checked with the shared schema before it is
 * sent; the server's field problems land on the same rows.
 */
export function TargetTableEditor({ initial, saving, onSave, reopens = false }: TargetTableEditorProps) {
  const [formError, setFormError] = useState('');
  const speedUnit = useUnits().damperVelocity;
  // The form holds speeds as shown; what reaches onSave is the SI body the schema accepted.
  const resolver = useMemo<Resolver<TargetSheetContent>>(
    () => async (values, _ctx, options) => {
      const parsed = TargetSheetContent.safeParse(sheetContentToSI(values, speedUnit));
      if (parsed.success) return { values: parsed.data, errors: {} };
      const flat: Record<string, { type: string; message: string }> = {};
      for (const issue of parsed.error.issues) flat[issue.path.map(String).join('.')] ??= { type: issue.code, message: sheetIssueMessage(issue, speedUnit) };
      return { values: {}, errors: toNestErrors(flat as FieldErrors, options) };
    },
    [speedUnit],
  );
  const {
    control,
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isDirty },
  } = useForm<TargetSheetContent>({ resolver, defaultValues: sheetContentShown(initial, speedUnit) });

  const submit = handleSubmit(async (values) => {
    setFormError('');
    try {
      await onSave(values);
      reset(sheetContentShown(values, speedUnit));
    } catch (e) {
      if (!isApiError(e)) return setFormError('Something went wrong. Try again.');
      for (const f of e.fields) setError(f.path as Path<TargetSheetContent>, { type: 'server', message: f.message });
      setFormError(e.message);
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Edit targets" className="space-y-4">
      <div className="grid gap-5 lg:grid-cols-2">
        <DirectionEditor direction="compression" control={control} register={register} errors={errors} speedUnit={speedUnit} />
        <DirectionEditor direction="rebound" control={control} register={register} errors={errors} speedUnit={speedUnit} />
      </div>
      <div className="grid gap-4 md:grid-cols-[14rem_1fr]">
        <div>
          <Field label="Gas force [N]" error={errors.gasForce?.message} hint="Stated on the sheet; the targets exclude it.">
            <Input type="number" step="any" className="figures" {...register('gasForce', { valueAsNumber: true })} />
          </Field>
          <Caution className="mt-2">{sheetCautions.gas}</Caution>
        </div>
        <Field label="Notes for the supplier" error={errors.notes?.message}>
          <Textarea rows={4} {...register('notes')} />
        </Field>
      </div>
      <FormError message={formError} />
      <div className="flex items-center gap-3">
        <Button type="submit" variant="primary" busy={saving} disabled={!isDirty && !reopens}>
          {reopens ? 'Save and reopen as draft' : 'Save targets'}
        </Button>
        {isDirty && <span className="text-sm text-ink-faint">Unsaved changes</span>}
      </div>
    </form>
  );
}
