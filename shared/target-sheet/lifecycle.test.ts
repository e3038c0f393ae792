import { describe, expect, it } from 'vitest';
import { roles, type Role } from '../schemas/workspace.ts';
import { targetSheetStatuses, type TargetSheetStatus } from '../schemas/target-sheet.ts';
import { allowedTransitions, canSupersede, canTransition, checkTransition, isSheetEditable } from './lifecycle.ts';

// Every (from, to) pair with the roles that may make it; anything not listed is refused for all.
const allowed: [TargetSheetStatus, TargetSheetStatus, Role[]][] = [
  ['draft', 'in_review', ['engineer', 'lead', 'admin']],
  ['in_review', 'released', ['lead', 'admin']],
  ['in_review', 'returned', ['lead', 'admin']],
  ['returned', 'draft', ['engineer', 'lead', 'admin']],
];

describe('canTransition', () => {
  const cases = targetSheetStatuses.flatMap((from) =>
    targetSheetStatuses.flatMap((to) =>
      roles.map((role) => {
        const row = allowed.find(([f, t]) => f === from && t === to);
        return [from, to, role, row ? row[2].includes(role) : false] as const;
      }),
    ),
  );
  it.each(cases)('%s → %s as %s: %s', (from, to, role, expected) => {
    expect(canTransition(from, to, role)).toBe(expected);
  });
});

describe('checkTransition', () => {
  it('refuses every move out of released, saying to supersede', () => {
    for (const to of targetSheetStatuses) {
      const r = checkTransition('released', to, 'admin');
      expect(r).toMatchObject({ ok: false, code: 'conflict' });
      if (!r.ok) expect(r.message).toMatch(/supersedes/);
    }
  });

  it('refuses an engineer releasing, as forbidden', () => {
    expect(checkTransition('in_review', 'released', 'engineer')).toMatchObject({ ok: false, code: 'forbidden' });
  });

  it('needs a reason to return a sheet', () => {
    expect(checkTransition('in_review', 'returned', 'lead')).toMatchObject({ ok: false, code: 'bad_request' });
    expect(checkTransition('in_review', 'returned', 'lead', '   ')).toMatchObject({ ok: false, code: 'bad_request' });
    expect(checkTransition('in_review', 'returned', 'lead', 'rebound at 0.1 m/s too high')).toMatchObject({ ok: true, transition: { action: 'return' } });
  });
});

describe('lifecycle helpers', () => {
  it('lists the buttons a role sees', () => {
    expect(allowedTransitions('in_review', 'lead').map((t) => t.action)).toEqual(['release', 'return']);
    expect(allowedTransitions('in_review', 'engineer')).toEqual([]);
    expect(allowedTransitions('draft', 'viewer')).toEqual([]);
  });

  it('lets only drafts change and only an unsuperseded released sheet be superseded', () => {
    expect(targetSheetStatuses.filter(isSheetEditable)).toEqual(['draft']);
    expect(canSupersede({ status: 'released', supersededBy: null })).toBe(true);
    expect(canSupersede({ status: 'released', supersededBy: { id: 'x', number: 'TS-AB-2026-0002' } })).toBe(false);
    expect(canSupersede({ status: 'in_review', supersededBy: null })).toBe(false);
  });
});
