import { describe, expect, it } from 'vitest';
import { StudyDefinition } from '../../../../shared/schemas/study.ts';
import { defaultFormValues, fieldOfIssue, formToDefinition } from './study-form.ts';

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
    expect(d.axes[1]).toEqual({ parameter: 'springRate', from: 22000, to: 42000, steps: 6, spacing: 'linear' });
    expect(d.roads[0]).toEqual({ source: 'inline', road: { kind: 'iso8608', name: 'ISO 8608 class C', class: 'C', seed: 7 } });
    // limits are entered in per cent
    expect(d.constraints.maxStrokeUsed).toBeCloseTo(0.9, 12);
    expect(d.constraints.maxLiftOffFraction).toBeCloseTo(0.01, 12);
    expect(d.constraints.minTyreLoad).toBeUndefined();
  });

  it('one axis when the second is off; speeds from a list; library roads with a seed', () => {
    const v = { ...defaultFormValues('library:road-9'), setupId: 's', revision: '3', twoAxes: false, speeds: '15, 25 30', roads: [{ choice: 'library:road-9', seed: '42' }] };
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
});
