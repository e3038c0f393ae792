import { describe, expect, it } from 'vitest';
import { createEventTracker, findCrossing } from './event-tracker.ts';

describe('findCrossing (Illinois regula falsi)', () => {
  it('finds the zero of cos t in (0, 2) at π/2 and stays on the starting side', () => {
    // cos(π/2) = 0 (textbook); the left end of the final bracket keeps cos > 0 or = 0.
    const t = findCrossing(Math.cos, 0, 2);
    expect(t).toBeCloseTo(Math.PI / 2, 12);
    expect(Math.cos(t)).toBeGreaterThanOrEqual(-1e-15);
  });

  it('converges on a steep, lopsided function where plain regula falsi stalls', () => {
    // x¹⁰ − 0.5 on (0, 1): root 0.5^(1/10) (closed form); plain false position keeps one end fixed.
    const t = findCrossing((x) => x ** 10 - 0.5, 0, 1);
    expect(t).toBeCloseTo(0.5 ** 0.1, 12);
  });
});

describe('EventTracker', () => {
  // Two switches given as straight lines in t: s0 = 1 − t (crosses at 1), s1 = t − 3 (at 3).
  const line = (t: number) => [1 - t, t - 3];

  it('says nothing changed while every switch keeps its sign', () => {
    const tr = createEventTracker(2);
    tr.start(line(0));
    expect(tr.changed(line(0.9))).toBe(false);
    expect(tr.displaced).toBe(false);
  });

  it('locates the earliest of two crossings inside a step and passes it', () => {
    const tr = createEventTracker(2);
    tr.start(line(0));
    expect(tr.changed(line(4))).toBe(true);
    expect(tr.locate((k, t) => line(t)[k], 0, 4)).toBe(true);
    expect(tr.pending?.which).toBe(0);
    expect(tr.pending?.time).toBeCloseTo(1, 12);
    expect(tr.pending?.after).toBe(-1);
    expect(tr.events).toBe(1);
    const e = tr.pass();
    expect(e.which).toBe(0);
    expect(tr.pending).toBeNull();
    // Switch 0 is now in its other regime: the tracker counts as displaced until it returns.
    expect(tr.displaced).toBe(true);
    expect(tr.changed(line(1.5))).toBe(false);
    tr.accept(line(0.5));
    expect(tr.displaced).toBe(false);
  });

  it('a value inside the deadband keeps the regime (a wheel resting exactly on the road)', () => {
    const tr = createEventTracker(1, { deadbands: [1e-6] });
    tr.start([1]);
    expect(tr.changed([-1e-7])).toBe(false);
    tr.accept([-1e-7]);
    expect(tr.changed([-1])).toBe(true);
  });

  it('does not count a crossing at the very start of the step', () => {
    const tr = createEventTracker(1);
    tr.start([1]);
    expect(tr.changed([-1])).toBe(true);
    // Zero at t = 2, the step's start: nothing to integrate up to.
    expect(tr.locate((_k, t) => 2 - t, 2, 3)).toBe(false);
    expect(tr.pending).toBeNull();
  });

  it('stops locating once its event budget is spent (a chattering contact is stepped across)', () => {
    const tr = createEventTracker(1, { maxEvents: 1 });
    tr.start([1]);
    tr.changed([-1]);
    expect(tr.locate((_k, t) => 1 - t, 0, 2)).toBe(true);
    tr.pass();
    tr.changed([1]);
    expect(tr.locate((_k, t) => t - 3, 2, 4)).toBe(false);
  });

  it('tracks any number of switches, so a model can add a force law of its own', () => {
    const tr = createEventTracker(4);
    tr.start([1, -1, -1, -1]);
    expect(tr.changed([1, -1, -1, 1])).toBe(true);
    expect(tr.locate((k, t) => (k === 3 ? t - 0.25 : [1, -1, -1][k]), 0, 1)).toBe(true);
    expect(tr.pending?.which).toBe(3);
    expect(tr.pending?.time).toBeCloseTo(0.25, 12);
  });

  it('refuses to pass when no event is pending', () => {
    expect(() => createEventTracker(1).pass()).toThrow(/no pending event/);
  });
});
