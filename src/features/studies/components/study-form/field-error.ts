import { type FieldErrors, useFormContext, useFormState } from 'react-hook-form';
import type { StudyDefinition } from '../../../../../shared/schemas/study.ts';
import type { StudyFormValues } from '../../model/study-form.ts';

/** The study form as its fieldsets see it (values in form shape, a definition out). */
export const useStudyFormContext = () => useFormContext<StudyFormValues, unknown, StudyDefinition>();

const errorAt = (errors: FieldErrors<StudyFormValues>, path: string): string | undefined => {
  let node: unknown = errors;
  for (const part of path.split('.')) node = (node as Record<string, unknown> | undefined)?.[part];
  return (node as { message?: string } | undefined)?.message;
};

/** The message for a field by its dotted path (`axes.0.from`), from the schema or the server. */
export function useFieldError(): (path: string) => string | undefined {
  const { control } = useStudyFormContext();
  const { errors } = useFormState({ control });
  return (path) => errorAt(errors, path);
}
