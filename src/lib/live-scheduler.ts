/**
 * When live mode runs. Leading and trailing edge: an edit after a quiet spell starts a run at
 * once (a single change shows its effect as fast as the simulation allows); edits that keep
 * coming (typing, dragging a point) restart a `quietMs` timer and only the last state runs. A
 * run still in flight when a newer edit arrives is cancelled: its figures would be stale.
 */

export interface LiveTimers {
  now(): number;
  setTimeout(fn: () => void, ms: number): unknown;
  clearTimeout(handle: unknown): void;
}

export interface LiveSchedulerOptions<S> {
  /** Starts a run of `state`; the signal fires when the run is superseded. Resolves when it ends. */
  run: (state: S, signal: AbortSignal) => Promise<void>;
  quietMs?: number;
  timers?: LiveTimers;
}

const browserTimers: LiveTimers = {
  now: () => performance.now(),
  setTimeout: (fn, ms) => setTimeout(fn, ms),
  clearTimeout: (h) => clearTimeout(h as ReturnType<typeof setTimeout>),
};

export class LiveScheduler<S> {
  private readonly run: LiveSchedulerOptions<S>['run'];
  private readonly quietMs: number;
  private readonly timers: LiveTimers;
  private lastChange = -Infinity;
  private timer: unknown = null;
  private inFlight: AbortController | null = null;
  private disposed = false;

  constructor(options: LiveSchedulerOptions<S>) {
    this.run = options.run;
    this.quietMs = options.quietMs ?? 150;
    this.timers = options.timers ?? browserTimers;
  }

  /** The edited state changed. */
  change(state: S): void {
    if (this.disposed) return;
    const now = this.timers.now();
    const quiet = now - this.lastChange >= this.quietMs;
    this.lastChange = now;
    this.inFlight?.abort();
    this.inFlight = null;
    if (this.timer !== null) this.timers.clearTimeout(this.timer);
    this.timer = null;
    if (quiet) this.start(state);
    else this.timer = this.timers.setTimeout(() => ((this.timer = null), this.start(state)), this.quietMs);
  }

  /** Stops whatever runs or waits (the panel unmounts). */
  dispose(): void {
    this.disposed = true;
    this.inFlight?.abort();
    if (this.timer !== null) this.timers.clearTimeout(this.timer);
  }

  private start(state: S): void {
    const controller = new AbortController();
    this.inFlight = controller;
    void this.run(state, controller.signal).finally(() => {
      if (this.inFlight === controller) this.inFlight = null;
    });
  }
}
