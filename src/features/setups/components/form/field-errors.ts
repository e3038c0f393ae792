/** Zod's wording for a missing or non-numeric value, said the way a person would. */
export function friendlyError(message: string | undefined): string | undefined {
  if (!message) return undefined;
  if (/received NaN/.test(message)) return 'Enter a number';
  if (/received undefined/.test(message)) return 'Required';
  if (/Too small: expected number to be >0/.test(message)) return 'Must be above 0';
  if (/Too small: expected number to be >=0/.test(message)) return 'Must not be negative';
  return message;
}
