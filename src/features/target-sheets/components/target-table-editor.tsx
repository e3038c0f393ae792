import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { type Control, type FieldErrors, type Path, type UseFormRegister, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { TargetSheetContent, type TargetPoint } from '../../../../shared/schemas/target-sheet.ts';
import { sheetCautions } from '../../../../shared/target-sheet/cautions.ts';
import { toleranceBand } from '../../../../shared/target-sheet/band.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Textarea } from '../../../components/ui/field.tsx';
import { Caution } from '../../../components/ui/notice.tsx';
import { Table, TBody, Td, Th, THead, Tr } from '../../../components/ui/table.tsx';
import { isApiError } from '../../../lib/api-client.ts';

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
      for (const [field, e] of Object.entries(row)) if (e && typeof e === 'object' && 'message' in e && e.message) out.push(`point ${i + 1}, ${field}: ${String(e.message)}`);
    });
  }
  return out;
}

function DirectionEditor({
  direction,
  control,
  register,
  errors,
}: {
  direction: Direction;
  control: Control<TargetSheetContent>;
  register: UseFormRegister<TargetSheetContent>;
  errors: FieldErrors<TargetSheetContent>;
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
            <Th numeric>Speed [m/s]</Th>
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
          const v = tail && Number.isFinite(tail.velocity) ? Math.round(tail.velocity * 1.5 * 1000) / 1000 : 0.1;
          append({ velocity: v, force: tail?.force ?? 0, tolPct: tail?.tolPct ?? 10, floorN: tail?.floorN ?? 20 });
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
 * point (the band they give shown live), plus the gas force and notes. Checked with the shared
 * schema before it is sent; the server's field problems land on the same rows.
 */
export function TargetTableEditor({ initial, saving, onSave, reopens = false }: TargetTableEditorProps) {
  const [formError, setFormError] = useState('');
  const {
    control,
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isDirty },
  } = useForm<TargetSheetContent>({ resolver: zodResolver(TargetSheetContent), defaultValues: initial });

  const submit = handleSubmit(async (values) => {
    setFormError('');
    try {
      await onSave(values);
      reset(values);
    } catch (e) {
      if (!isApiError(e)) return setFormError('Something went wrong. Try again.');
      for (const f of e.fields) setError(f.path as Path<TargetSheetContent>, { type: 'server', message: f.message });
      setFormError(e.message);
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Edit targets" className="space-y-4">
      <div className="grid gap-5 lg:grid-cols-2">
        <DirectionEditor direction="compression" control={control} register={register} errors={errors} />
        <DirectionEditor direction="rebound" control={control} register={register} errors={errors} />
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
