import type { Setup } from '../../shared/schemas/setup.ts';

/** JSON with object keys sorted, so two documents compare by content whatever order their keys came in. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    entries.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** Same setup values, ignoring the name (the name belongs to the setup, not to a revision). */
export function sameSetupContent(a: Setup, b: Setup): boolean {
  return canonical({ ...a, name: '' }) === canonical({ ...b, name: '' });
}
