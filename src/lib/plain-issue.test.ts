import { z } from 'zod';
import { describe, expect, test } from 'vitest';
import { units } from './format.ts';
import { plainIssue } from './plain-issue.ts';

const issueOf = (schema: z.ZodType, value: unknown) => {
  const parsed = schema.safeParse(value);
  if (parsed.success) throw new Error('expected a failure');
  return parsed.error.issues[0];
};

describe('plainIssue', () => {
  test('bounds are converted to the unit the field is shown in', () => {
    // 0.005 m shown in mm
    expect(plainIssue(issueOf(z.number().min(0.005), 0.001), { label: 'Clearance', unit: units.mm })).toBe('Clearance must be 5 mm or more');
    expect(plainIssue(issueOf(z.number().lt(2000), 2500), { label: 'Sprung mass', unit: units.kg })).toBe('Sprung mass must be below 2 000 kg');
  });

  test('text, lists and custom rules', () => {
    expect(plainIssue(issueOf(z.string().max(3), 'abcd'), { label: 'Name' })).toBe('Name must be 3 characters or fewer');
    expect(plainIssue(issueOf(z.array(z.number()).max(2), [1, 2, 3]), { label: 'Table' })).toBe('Table can have at most 2 points');
    const custom = z.number().refine((x) => x % 2 === 0, 'use an even number');
    expect(plainIssue(issueOf(custom, 3), { label: 'Count' })).toBe('Count: use an even number');
    expect(plainIssue(issueOf(z.enum(['a', 'b']), 'c'), { label: 'Law' })).toBe('Law must be one of: a, b');
  });

  test('the validator wording never comes through', () => {
    for (const [schema, value] of [
      [z.number().positive(), -1],
      [z.number(), 'x'],
      [z.number(), Number.NaN],
      [z.string().regex(/^a$/), 'b'],
      [z.strictObject({ a: z.number() }), { a: 1, b: 2 }],
    ] as const) {
      expect(plainIssue(issueOf(schema, value), { label: 'Value' })).not.toMatch(/expected|Too small|Too big|Invalid input/);
    }
  });
});
