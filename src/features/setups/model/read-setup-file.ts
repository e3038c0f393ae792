import type { FieldIssue } from '../../../../shared/errors.ts';
import { Setup } from '../../../../shared/schemas/setup.ts';
import { setupIssueMessage } from './setup-problems.ts';

export type SetupFileOutcome = { ok: true; json: unknown; setup: Setup } | { ok: false; message: string; issues: FieldIssue[] };

/** Largest setup file the page reads (a setup is a few kB; this only stops a wrong file early). */
export const MAX_SETUP_FILE_BYTES = 512 * 1024;

/**
 * Reads a setup file's text and checks it against the shared setup schema, so a problem is
 * shown with its place in the file before anything is sent or put in the form.
 */
export function checkSetupText(text: string): SetupFileOutcome {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return { ok: false, message: `This file is not JSON: ${(error as Error).message}`, issues: [] };
  }
  const parsed = Setup.safeParse(json);
  if (!parsed.success) {
    return {
      ok: false,
      message: 'This file is not a valid setup.',
      issues: parsed.error.issues.map((i) => ({ path: i.path.map(String).join('.') || '(file)', message: setupIssueMessage(i, json) })),
    };
  }
  return { ok: true, json, setup: parsed.data };
}

export async function readSetupFile(file: File): Promise<SetupFileOutcome> {
  if (file.size > MAX_SETUP_FILE_BYTES) return { ok: false, message: `This file is ${Math.round(file.size / 1024)} kB; a setup file is a few kB.`, issues: [] };
  return checkSetupText(await file.text());
}
