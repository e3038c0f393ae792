import { describe, expect, test } from 'vitest';
import { Road } from '../../../../shared/schemas/road.ts';
import { candidateOf, defaultRoads, textsOf } from './road-fields.ts';

describe('road fields', () => {
  test.each(Object.entries(defaultRoads))('the default %s road is valid and reads back as the same texts', (kind, texts) => {
    const road = Road.parse(candidateOf(kind as never, texts));
    const again = textsOf(road);
    for (const [k, v] of Object.entries(texts)) if (v !== '') expect(again[k]).toBe(v);
  });

  test('heights typed in mm are stored in m', () => {
    const road = Road.parse(candidateOf('bump', { height: '50', length: '0.6', at: '10' }));
    expect(road).toMatchObject({ kind: 'bump', height: 0.05, length: 0.6, at: 10 });
  });

  test('a blank required field is named by the schema', () => {
    const out = Road.safeParse(candidateOf('kerb', { height: '', rampLength: '0.1', at: '1' }));
    expect(out.success).toBe(false);
    expect(out.error?.issues[0].path).toEqual(['height']);
  });
});
