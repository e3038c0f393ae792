import { describe, expect, it } from 'vitest';
import { DEFAULT_UNIT_PREFERENCES } from '../../../shared/schemas/unit-preferences.ts';
import { landingPath, safeNext } from './landing.ts';

describe('safeNext', () => {
  it.each([
    ['/w/abc/team', '/w/abc/team'],
    ['https://elsewhere.example/', null],
    ['//elsewhere.example/x', null],
    ['/\\elsewhere.example', null],
    ['', null],
    [null, null],
  ])('%s → %s', (input, expected) => {
    expect(safeNext(input)).toBe(expected);
  });
});

describe('landingPath', () => {
  const user = { id: 'u1', name: 'A', email: 'a@x.example', emailVerified: true };
  const units = { ...DEFAULT_UNIT_PREFERENCES };
  it('opens the first workspace when none was remembered (no storage in node)', () => {
    const me = { user, memberships: [{ workspaceId: 'w1', workspaceName: 'One', role: 'viewer' as const }, { workspaceId: 'w2', workspaceName: 'Two', role: 'admin' as const }], units };
    expect(landingPath(me)).toBe('/w/w1');
  });
  it('sends someone without a workspace to their account page', () => {
    expect(landingPath({ user, memberships: [], units })).toBe('/account');
  });
});
