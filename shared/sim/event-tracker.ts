/**
 * Regime switches of the corner (tyre lift-off and landing, stop contact, and whatever other
 * force law a model switches on a function of its state) as the integrators see them: each
 * switch is a value whose sign tells the regime (`CornerModel.switches`). The tracker knows
 * the regime each switch is in, tells when a step ended in another one, finds the earliest
 * crossing inside the step, and holds the one event the integration is heading for.
 *
 * Nothing here knows what a switch means, so a model can add switches without touching the
 * integrators; a switch whose value sits inside its deadband keeps its previous regime (a
 * wheel resting exactly on the road is not a landing).
 */

/** Values closer to zero than this count as on the boundary: N for the tyre, m for the stops; unlisted switches use the last entry. */
export const DEFAULT_DEADBANDS: readonly number[] = [1e-9, 1e-12];

/** Left ends closer than this (relative to t) to the step's start do not count as a crossing inside it. */
const MIN_EVENT_OFFSET = 1e-10;
/** Illinois iterations; the bracket is below 1e-13 s long well before this. */
const MAX_ITERATIONS = 60;

/** The switch the integration stops at next: its index, its time and the sign it takes there. */
export interface PendingEvent {
  which: number;
  time: number;
  after: 1 | -1;
}

export interface EventTracker {
  /** Located events so far. */
  readonly events: number;
  /** The event the integration is heading for, if any. */
  readonly pending: PendingEvent | null;
  /** True while some switch is in another regime than when tracking started (a stop touching, the wheel in the air). */
  readonly displaced: boolean;
  /** Starts (or restarts) tracking from the switch values at an instant; a pending event stays. */
  start(values: ArrayLike<number>): void;
  /** True when some switch at `values` is clearly in the other regime than the tracker holds. */
  changed(values: ArrayLike<number>): boolean;
  /**
   * After `changed`: the earliest crossing in (a, b] among the switches that changed, located
   * on `valueAt(k, t)` (switch k at time t, from the step's dense output), kept as `pending`.
   * Returns false (nothing kept) when the crossing sits at the step's start, or the event
   * budget is spent: the step is then taken as it is.
   */
  locate(valueAt: (k: number, t: number) => number, a: number, b: number): boolean;
  /** Takes the regimes at the end of an accepted step. */
  accept(values: ArrayLike<number>): void;
  /** The integration reached the pending event: its switch changes regime; returns the event. */
  pass(): PendingEvent;
}

/**
 * Earliest zero of f in (a, b] by the Illinois variant of regula falsi, given f(a) and f(b) of
 * opposite signs. Returns the left end of the final bracket, so a restart there lands on the
 * old regime's side of the switch or on it.
 */
export function findCrossing(f: (t: number) => number, a: number, b: number): number {
  let fa = f(a);
  let fb = f(b);
  let side = 0;
  for (let it = 0; it < MAX_ITERATIONS && b - a > 1e-13 * Math.max(1, b); it++) {
    const c = (a * fb - b * fa) / (fb - fa);
    const fc = f(c);
    if (fc * fb > 0) {
      b = c;
      fb = fc;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = c;
      fa = fc;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  return a;
}

export function createEventTracker(count: number, options: { deadbands?: readonly number[]; maxEvents?: number } = {}): EventTracker {
  const bands = options.deadbands ?? DEFAULT_DEADBANDS;
  const deadband = Float64Array.from({ length: count }, (_, k) => bands[Math.min(k, bands.length - 1)]);
  const maxEvents = options.maxEvents ?? Infinity;
  const regime = new Int8Array(count);
  const initial = new Int8Array(count);
  const now = new Int8Array(count);
  let displaced = false;
  const update = () => {
    displaced = false;
    for (let k = 0; k < count; k++) if (regime[k] !== initial[k]) displaced = true;
  };
  let events = 0;
  let started = false;
  let pending: PendingEvent | null = null;

  const signOf = (k: number, v: number) => (v > deadband[k] ? 1 : v < -deadband[k] ? -1 : 0);

  return {
    get events() {
      return events;
    },
    get pending() {
      return pending;
    },
    get displaced() {
      return displaced;
    },
    start(values) {
      for (let k = 0; k < count; k++) regime[k] = signOf(k, values[k]);
      if (!started) initial.set(regime);
      started = true;
      update();
    },
    changed(values) {
      let any = false;
      for (let k = 0; k < count; k++) {
        now[k] = signOf(k, values[k]);
        if (regime[k] !== 0 && now[k] !== 0 && now[k] !== regime[k]) any = true;
      }
      return any;
    },
    locate(valueAt, a, b) {
      if (events >= maxEvents) return false;
      let first = Infinity;
      let which = -1;
      for (let k = 0; k < count; k++) {
        if (regime[k] === 0 || now[k] === 0 || now[k] === regime[k]) continue;
        const t = findCrossing((x) => valueAt(k, x), a, b);
        if (t < first) {
          first = t;
          which = k;
        }
      }
      if (which < 0 || first - a <= MIN_EVENT_OFFSET * Math.max(1, a)) return false;
      pending = { which, time: first, after: now[which] as 1 | -1 };
      events++;
      return true;
    },
    accept(values) {
      for (let k = 0; k < count; k++) {
        const s = signOf(k, values[k]);
        if (s !== 0) regime[k] = s;
      }
      update();
    },
    pass() {
      if (!pending) throw new Error('EventTracker.pass: no pending event');
      const e = pending;
      regime[e.which] = e.after;
      pending = null;
      update();
      return e;
    },
  };
}
