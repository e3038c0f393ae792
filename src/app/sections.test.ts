import { describe, expect, it } from 'vitest';
import { navEntries, sections } from './sections.ts';

describe('the rail', () => {
  it('lists Compare as a section of its own, between Runs and Studies, and mounts its page', () => {
    const labels = navEntries.map((e) => e.label);
    expect(labels.indexOf('Compare')).toBe(labels.indexOf('Runs') + 1);
    expect(labels.indexOf('Studies')).toBe(labels.indexOf('Compare') + 1);
    const paths = sections.flatMap((s) => s.workspaceRoutes ?? []).map((r) => r.path);
    expect(paths.filter((p) => p === 'compare')).toHaveLength(1);
  });
});
