import { describe, expect, it } from 'vitest';
import { withRawJson } from './json-splice.ts';

describe('withRawJson', () => {
  it('gives the same JSON as writing the whole object', () => {
    const road = { kind: 'measured', points: [[0, 0.001], [0.1, -0.002]] };
    const text = withRawJson({ id: 'r1', name: 'Lane "west"' }, 'definition', JSON.stringify(road));
    expect(JSON.parse(text)).toEqual({ id: 'r1', name: 'Lane "west"', definition: road });
  });

  it('works on an empty head and refuses a key the head already has', () => {
    expect(JSON.parse(withRawJson({}, 'roads', '[1,2]'))).toEqual({ roads: [1, 2] });
    expect(() => withRawJson({ roads: [] }, 'roads', '[]')).toThrow(/already set/);
  });
});
