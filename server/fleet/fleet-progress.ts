import type { FleetProgress } from '../../shared/schemas/fleet.ts';
import type { FleetRunView } from './fleet.repository.ts';

/** A reading of the run's counter, for the rate over the last few seconds. */
export interface RunsSample {
  at: number;
  runs: number;
}

// Chunks land in bursts (each stores a second or more of runs at once), so the window spans
// several of them before its rate is trusted.
const WINDOW_MS = 20_000;
const MIN_SPAN_MS = 5_000;

/**
 * Progress as the page shows it. The rate is taken over the last 20 s of `samples` when they
 * span at least 5 s, else over the whole of this start; time left assumes it holds.
 */
export function progressOf(row: FleetRunView, now: number, samples: readonly RunsSample[] = []): FleetProgress {
  const live = row.state === 'running';
  const recent = samples.filter((s) => s.at >= now - WINDOW_MS);
  let rate: number | null = null;
  if (recent.length >= 2 && recent[recent.length - 1].at - recent[0].at >= MIN_SPAN_MS) {
    rate = (recent[recent.length - 1].runs - recent[0].runs) / ((recent[recent.length - 1].at - recent[0].at) / 1000);
  } else {
    const end = row.finished_at ? Date.parse(row.finished_at) : now;
    const seconds = (end - Date.parse(row.started_at)) / 1000;
    const runs = row.runs_done - row.runs_at_start;
    if (seconds > 0.5 && runs > 0) rate = runs / seconds;
  }
  const left = row.runs_total - row.runs_done;
  return {
    state: row.state,
    unitsDone: row.units_done,
    unitsTotal: row.units_total,
    runsDone: row.runs_done,
    runsTotal: row.runs_total,
    runsPerSecond: rate,
    secondsLeft: live && rate && rate > 0 ? left / rate : null,
    error: row.error,
    startedBy: { id: row.started_by, name: row.started_by_name },
    startedAt: row.started_at,
    finishedAt: row.finished_at,
  };
}

/** Keeps the samples of the last window, adding the current reading. */
export function withSample(samples: RunsSample[], sample: RunsSample): RunsSample[] {
  return [...samples.filter((s) => s.at >= sample.at - WINDOW_MS), sample];
}
