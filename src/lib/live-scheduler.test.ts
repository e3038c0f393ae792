import { describe, expect, it } from 'vitest';
import { LiveScheduler, type LiveTimers } from './live-scheduler.ts';

/** Hand-driven clock: `advance` fires due timers in order. */
function fakeTimers() {
  let now = 1000;
  let seq = 0;
  const pending = new Map<number, { at: number; fn: () => void }>();
  const timers: LiveTimers = {
    now: () => now,
    setTimeout: (fn, ms) => (pending.set(++seq, { at: now + ms, fn }), seq),
    clearTimeout: (h) => void pending.delete(h as number),
  };
  const advance = (ms: number) => {
    now += ms;
    for (const [id, t] of [...pending].sort((a, b) => a[1].at - b[1].at)) {
      if (t.at <= now) {
        pending.delete(id);
        t.fn();
      }
    }
  };
  return { timers, advance };
}

function recorder() {
  const started: { state: number; signal: AbortSignal }[] = [];
  const run = (state: number, signal: AbortSignal) => {
    started.push({ state, signal });
    return new Promise<void>(() => undefined); // never ends by itself: the test looks at signals
  };
  return { started, run };
}

describe('live scheduler', () => {
  it('runs a single edit at once', () => {
    const { timers } = fakeTimers();
    const rec = recorder();
    const s = new LiveScheduler({ run: rec.run, timers, quietMs: 150 });
    s.change(1);
    expect(rec.started.map((r) => r.state)).toEqual([1]);
  });

  it('coalesces a burst: the first edit runs, later ones cancel it and only the last state runs after the quiet time', () => {
    const { timers, advance } = fakeTimers();
    const rec = recorder();
    const s = new LiveScheduler({ run: rec.run, timers, quietMs: 150 });
    s.change(1);
    advance(40);
    s.change(2);
    advance(40);
    s.change(3);
    expect(rec.started.map((r) => r.state)).toEqual([1]);
    expect(rec.started[0].signal.aborted).toBe(true);
    advance(149);
    expect(rec.started).toHaveLength(1);
    advance(1);
    expect(rec.started.map((r) => r.state)).toEqual([1, 3]);
    expect(rec.started[1].signal.aborted).toBe(false);
  });

  it('treats an edit after a quiet spell as a new leading edge', () => {
    const { timers, advance } = fakeTimers();
    const rec = recorder();
    const s = new LiveScheduler({ run: rec.run, timers, quietMs: 150 });
    s.change(1);
    advance(500);
    s.change(2);
    expect(rec.started.map((r) => r.state)).toEqual([1, 2]);
    expect(rec.started[0].signal.aborted).toBe(true); // still in flight, now stale
  });

  it('cancels what runs and what waits on dispose', () => {
    const { timers, advance } = fakeTimers();
    const rec = recorder();
    const s = new LiveScheduler({ run: rec.run, timers, quietMs: 150 });
    s.change(1);
    s.change(2);
    s.dispose();
    advance(1000);
    expect(rec.started.map((r) => r.state)).toEqual([1]);
    expect(rec.started[0].signal.aborted).toBe(true);
  });
});
