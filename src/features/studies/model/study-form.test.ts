import { describe, expect, it } from 'vitest';
import { StudyDefinition } from '../../../../shared/schemas/study.ts';
import { Setup, type SetupInput } from '../../../../shared/schemas/setup.ts';
import { defaultFormValues, fieldOfIssue, formToDefinition, startingRange } from './study-form.ts';

const ids = (n: number) => (n === 3 ? 'rev-3' : undefined);

describe('study form', () => {
  it('turns the default form into a valid definition in SI units', () => {
    const v = { ...defaultFormValues('iso:C'), setupId: 'setup-1', revision: '3' };
    const parsed = StudyDefinition.safeParse(formToDefinition(v, ids));
    expect(parsed.success).toBe(true);
    if (!parsed.success) return;
    const d = parsed.data;
    expect(d.base).toEqual({ setupId: 'setup-1', revisionId: 'rev-3' });
    // spring rate is entered in N/mm
    expect(d.axes[1]).toEqual({ parameter: 'springRate', from: 14000, to: 42000, steps: 8, spacing: 'linear' });
    expect(d.roads[0]).toEqual({ source: 'inline', road: { kind: 'iso8608', name: 'ISO 8608 class C', class: 'C', seed: 7 } });
    // limits are entered in per cent
    expect(d.constraints.maxStrokeUsed).toBeCloseTo(0.9, 12);
    expect(d.constraints.maxLiftOffFraction).toBeCloseTo(0.01, 12);
    expect(d.constraints.minTyreLoad).toBeUndefined();
  });

  it('one axis when the second is off; speeds from a list in km/h (1 km/h = 1/3.6 m/s, SI brochure); library roads with a seed', () => {
    const v = { ...defaultFormValues('library:road-9'), setupId: 's', revision: '3', twoAxes: false, speeds: '54, 90 108', roads: [{ choice: 'library:road-9', seed: '42' }] };
    const d = StudyDefinition.parse(formToDefinition(v, ids));
    expect(d.axes).toHaveLength(1);
    expect(d.speeds).toEqual([15, 25, 30]);
    expect(d.roads[0]).toEqual({ source: 'library', roadId: 'road-9', seed: 42 });
  });

  it('a swept speed drops the speed list; a blank limit is no limit; text in a limit is an error on that field', () => {
    const v = { ...defaultFormValues('iso:B'), setupId: 's', revision: '3', twoAxes: false, axes: [{ parameter: 'speed' as const, from: 10, to: 30, steps: 3, spacing: 'linear' as const }], maxStrokeUsed: '', maxLiftOff: 'lots' };
    const r = StudyDefinition.safeParse(formToDefinition(v, ids));
    expect(r.success).toBe(false);
    if (r.success) return;
    expect(r.error.issues.map((i) => fieldOfIssue(i.path))).toEqual(['maxLiftOff']);
  });

  it('sends schema messages to the field that caused them', () => {
    expect(fieldOfIssue(['axes', 1, 'parameter'])).toBe('axes.1.parameter');
    expect(fieldOfIssue(['axes', 0, 'from'])).toBe('axes.0.from');
    expect(fieldOfIssue(['axes'])).toBe('axes.0.steps');
    expect(fieldOfIssue(['roads', 0, 'roadId'])).toBe('roads.0.choice');
    expect(fieldOfIssue(['base', 'revisionId'])).toBe('revision');
    expect(fieldOfIssue(['constraints', 'minTyreLoad'])).toBe('minTyreLoad');
    expect(fieldOfIssue(['objectives'])).toBe('objectives');
  });

  it('starts the spring range on the base: a 20.5 N/mm spring is the middle of 5 values, shown in N/mm', async () => {
    const { readFileSync } = await import('node:fs');
    const doc = JSON.parse(readFileSync(new URL('../../../../examples/pipit-front.setup.json', import.meta.url), 'utf8')) as SetupInput;
    const base = Setup.parse({ ...doc, springRate: 20500 });
    expect(startingRange('springRate', base)).toEqual({ from: 14.5, to: 26.5, steps: 5 });
    expect(startingRange('reboundScale', base)).toEqual({ from: 0.5, to: 1.5, steps: 5 });
    // before the base has loaded, a wide fixed range that still holds 20.5
    const fallback = startingRange('springRate', undefined);
    expect(fallback.from).toBeLessThan(20.5);
    expect(fallback.to).toBeGreaterThan(20.5);
  });

  it('sag limits are entered in mm and land on their fields', () => {
    const v = { ...defaultFormValues('iso:C'), setupId: 's', revision: '3', minSag: '150', maxSag: '180' };
    const d = StudyDefinition.parse(formToDefinition(v, ids));
    expect(d.constraints.minStaticSag).toBeCloseTo(0.15, 12);
    expect(d.constraints.maxStaticSag).toBeCloseTo(0.18, 12);
    const bad = StudyDefinition.safeParse(formToDefinition({ ...v, minSag: '200' }, ids));
    expect(bad.success).toBe(false);
    if (!bad.success) expect(fieldOfIssue(bad.error.issues[0].path)).toBe('maxSag');
  });
});
