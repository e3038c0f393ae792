/** Median of a list of numbers. */
export function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

export interface Timings {
  /** Wall-clock time per repeat, ms. */
  wall: number[];
  /**
   * CPU time (user + system) of this process per repeat, ms: what the work costs on one
   * core when other programs compete for the machine. It includes V8's helper threads
   * (garbage collection), so it can exceed the wall time on an idle machine.
   */
  cpu: number[];
}

/** Runs `fn` `repeats` times after `warmup` untimed calls. */
export function timeIt(fn: () => void, repeats: number, warmup = 1): Timings {
  for (let i = 0; i < warmup; i++) fn();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn();
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { wall, cpu };
}
