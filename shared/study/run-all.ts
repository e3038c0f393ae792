import type { Road } from '../schemas/road.ts';
import type { Setup } from '../schemas/setup.ts';
import type { StudyDefinition } from '../schemas/study.ts';
import type { StudyPointResult } from '../schemas/study-result.ts';
import { createPointCollector, studyRoadNames } from './collect.ts';
import { expandStudy } from './expand.ts';
import { createStudyRunner, studyRoadSlots } from './run-jobs.ts';

/**
 * A whole study run in this thread, in sweep order: the same runner the browser workers use and
 * the same collector, so the points equal a browser run's. For Node (the demo seed, tests,
 * scripts); the browser spreads the jobs over workers instead.
 */
export function runStudyHere(def: StudyDefinition, baseSetup: Setup, roads: Road[]): { points: StudyPointResult[]; base: StudyPointResult | null } {
  const expanded = expandStudy(def);
  const runner = createStudyRunner({ base: baseSetup, roads, duration: def.duration, settleTime: def.settleTime, roadSlots: studyRoadSlots(def) });
  const collector = createPointCollector(def, expanded, studyRoadNames(def, roads));
  for (const job of [...expanded.jobs, ...expanded.baseJobs]) {
    const values = job.pointIndex === -1 ? {} : expanded.points[job.pointIndex].values;
    const out = runner.run({ ...job, values });
    collector.add(job.pointIndex, out.run, out.setupError);
  }
  return { points: collector.points(), base: collector.base() };
}
