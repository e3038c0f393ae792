import type { DistanceProfile } from './excitation.ts';

/**
 * A single feature on an otherwise level road, given in closed form: its elevation, slope and
 * running integral (antiderivative from −∞), plus the distances where its slope jumps. The
 * integral lets the tyre footprint be applied exactly: the moving average over [x − L/2,
 * x + L/2] is (P(x + L/2) − P(x − L/2))/L and its slope (z(x + L/2) − z(x − L/2))/L.
 */
export interface EventShape {
  value(x: number): number;
  slope(x: number): number;
  integral(x: number): number;
  kinks: number[];
}

/** Half-sine of signed height `h` over [at, at + len]. */
export function halfSine(h: number, len: number, at: number): EventShape {
  const k = Math.PI / len;
  return {
    value: (x) => (x <= at || x >= at + len ? 0 : h * Math.sin(k * (x - at))),
    slope: (x) => (x <= at || x >= at + len ? 0 : h * k * Math.cos(k * (x - at))),
    integral: (x) => (x <= at ? 0 : x >= at + len ? (2 * h) / k : (h / k) * (1 - Math.cos(k * (x - at)))),
    kinks: [at, at + len],
  };
}

/** Straight ramp of signed height `h` from `at` over `len`, level at h afterwards. */
export function ramp(h: number, len: number, at: number): EventShape {
  return {
    value: (x) => (x <= at ? 0 : x >= at + len ? h : (h * (x - at)) / len),
    slope: (x) => (x <= at || x >= at + len ? 0 : h / len),
    integral: (x) => (x <= at ? 0 : x >= at + len ? (h * len) / 2 + h * (x - at - len) : (h * (x - at) ** 2) / (2 * len)),
    kinks: [at, at + len],
  };
}

/** The shape as a profile seen by a point contact, or averaged over a footprint (m). */
export function eventProfile(shape: EventShape, footprint?: number): DistanceProfile {
  if (!footprint) {
    return {
      at(x, out) {
        out[0] = shape.value(x);
        out[1] = shape.slope(x);
      },
      kinks: shape.kinks,
    };
  }
  const half = footprint / 2;
  return {
    at(x, out) {
      out[0] = (shape.integral(x + half) - shape.integral(x - half)) / footprint;
      out[1] = (shape.value(x + half) - shape.value(x - half)) / footprint;
    },
    // Averaging turns slope jumps into curvature jumps, but the slope of the average has
    // kinks where either window edge meets one of the shape's kinks.
    kinks: shape.kinks.flatMap((k) => [k - half, k + half]),
  };
}
