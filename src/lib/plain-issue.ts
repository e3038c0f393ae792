import type { z } from 'zod';
import type { DisplayUnit } from './format.ts';

/** What a validation issue is about, in the words and unit the page shows it in. */
export interface IssueSubject {
  /** "Sprung mass", "Rebound force at 0.52 m/s". */
  label: string;
  /** The unit the field is shown in; bounds are converted to it. Absent for words and ratios. */
  unit?: DisplayUnit;
}

/** One thing wrong with a draft: where (a field path, or a table cell), its name on the page, and the message in words. */
export interface Problem {
  path: string;
  label: string;
  message: string;
}

/** A bound as a person writes it: up to 4 significant figures, thousands grouped with a space. */
function bound(si: number | bigint, unit: DisplayUnit | undefined): string {
  const shown = unit ? unit.fromSI(Number(si)) : Number(si);
  const rounded = Number(shown.toPrecision(4));
  const [whole, frac] = Math.abs(rounded).toString().split('.');
  const grouped = whole.length >= 4 ? whole.replace(/\B(?=(\d{3})+(?!\d))/g, ' ') : whole;
  const text = `${rounded < 0 ? '−' : ''}${grouped}${frac ? `.${frac}` : ''}`;
  return unit?.symbol ? `${text} ${unit.symbol}` : text;
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * Every validation issue of the setup forms, said in plain words with the field's name and unit
 * ("Rebound force at 0.52 m/s must be 0 N or more"). The validator's own wording ("Too small:
 * expected number to be >=0") never reaches the page: messages written by our schemas (custom
 * rules) are kept, the rest are rebuilt here from the issue's code and bounds.
 */
export function plainIssue(issue: z.core.$ZodIssue, subject: IssueSubject): string {
  const { label, unit } = subject;
  switch (issue.code) {
    case 'too_small':
      if (issue.origin === 'array' || issue.origin === 'set') return `${label} needs at least ${plural(Number(issue.minimum), 'point')}`;
      if (issue.origin === 'string') return Number(issue.minimum) <= 1 ? `${label} cannot be empty` : `${label} needs at least ${plural(Number(issue.minimum), 'character')}`;
      return issue.inclusive === false ? `${label} must be above ${bound(issue.minimum, unit)}` : `${label} must be ${bound(issue.minimum, unit)} or more`;
    case 'too_big':
      if (issue.origin === 'array' || issue.origin === 'set') return `${label} can have at most ${plural(Number(issue.maximum), 'point')}`;
      if (issue.origin === 'string') return `${label} must be ${plural(Number(issue.maximum), 'character')} or fewer`;
      return issue.inclusive === false ? `${label} must be below ${bound(issue.maximum, unit)}` : `${label} must be ${bound(issue.maximum, unit)} or less`;
    case 'invalid_type':
      // zod reports NaN (text that is not a number) apart from a missing value
      if ((issue as { received?: string }).received === 'NaN') return `${label} must be a number${unit?.symbol ? ` in ${unit.symbol}` : ''}`;
      if (/received undefined/.test(issue.message)) return `${label} is required`;
      return issue.expected === 'number' ? `${label} must be a number${unit?.symbol ? ` in ${unit.symbol}` : ''}` : `${label} is not the right kind of value`;
    case 'custom':
      return `${label}: ${issue.message}`;
    case 'invalid_format':
      return issue.message.startsWith('Invalid') ? `${label} has characters that are not allowed` : `${label}: ${issue.message}`;
    case 'not_multiple_of':
      return `${label} must be a multiple of ${bound(Number(issue.divisor), unit)}`;
    case 'unrecognized_keys':
      return `${label} has entries this version does not know: ${issue.keys.join(', ')}`;
    case 'invalid_value':
      return `${label} must be one of: ${issue.values.map(String).join(', ')}`;
    default:
      return `${capital(label)} is not valid`;
  }
}
