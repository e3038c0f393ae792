import { describe, expect, it } from 'vitest';
import { rangeHistogram } from './range-histogram.ts';

describe('rangeHistogram', () => {
  it('counts every sample from `from` once, the maximum in the last bin', () => {
    const h = rangeHistogram([9, 9, 0, 1, 2, 3, 4], 4, 2);
    expect(h.edges).toEqual([0, 1, 2, 3, 4]);
    expect(h.counts).toEqual([1, 1, 1, 2]);
  });

  it('gives a constant signal one bin around its value', () => {
    expect(rangeHistogram([5, 5, 5], 10)).toEqual({ edges: [4.5, 5.5], counts: [3] });
  });
});
