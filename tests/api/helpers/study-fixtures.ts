import type { StudyDetail, StudyPointUpload } from '../../../shared/schemas/study-record.ts';
import { StudyDefinition, type StudyDefinitionInput } from '../../../shared/schemas/study.ts';
import { studyPointUpload } from '../../../shared/study/collect.ts';
import { runStudyHere } from '../../../shared/study/run-all.ts';
import type { Db } from '../../../server/db/database.ts';
import { finishStudyRun, saveStudyPoints } from '../../../server/studies/study-results.service.ts';
import { createStudy } from '../../../server/studies/studies.service.ts';
import { exampleSetup, insertSetup } from './runs.ts';

/** A small 2-D study (2 × 2 points of 4 s on one ISO class C road at 20 m/s) on a setup revision. */
export function studyDefinition(base: { setupId: string; revisionId: string }, over: Partial<StudyDefinitionInput> = {}): StudyDefinitionInput {
  return {
    name: 'Rebound against spring',
    base,
    axes: [
      { parameter: 'reboundScale', from: 0.8, to: 1.4, steps: 2 },
      { parameter: 'springRate', from: 26000, to: 38000, steps: 2 },
    ],
    roads: [{ source: 'inline', road: { kind: 'iso8608', name: 'Class C lane', class: 'C', seed: 7 } }],
    speeds: [20],
    duration: 4,
    objectives: [
      { figure: 'bodyAccelWkRms', weight: 1 },
      { figure: 'tyreLoadRatio', weight: 1 },
    ],
    constraints: { maxStrokeUsed: 0.9 },
    ...over,
  };
}

const cache = new Map<string, StudyPointUpload[]>();

/**
 * Every point (and the base setup) of a study run with the same code the browser workers run,
 * as the browser would save them. Cached per definition: the same definition gives the same runs.
 */
export function uploadsFor(detail: Pick<StudyDetail, 'definition' | 'baseSetup' | 'roads'>): StudyPointUpload[] {
  const key = JSON.stringify([detail.definition.axes, detail.definition.roads, detail.definition.speeds, detail.definition.duration, detail.baseSetup, detail.roads]);
  const hit = cache.get(key);
  if (hit) return hit;
  const { points, base } = runStudyHere(detail.definition, detail.baseSetup, detail.roads);
  const uploads: StudyPointUpload[] = [...points, ...(base ? [base] : [])].map(studyPointUpload);
  cache.set(key, uploads);
  return uploads;
}

export interface StudyFixture {
  setupId: string;
  revisionId: string;
  studyId: string;
  detail: StudyDetail;
}

const actorOf = (u: { id: string; name: string }) => ({ id: u.id, name: u.name });

/**
 * A setup (the example corner) and a study on its revision 1, made through the service as `author`.
 * `results`: 'none' leaves it a draft; 'partial' saves the first point; 'complete' saves all and finishes.
 */
export async function createStudyFixture(
  db: Db,
  workspaceId: string,
  author: { id: string; name: string },
  opts: { results?: 'none' | 'first-point' | 'complete'; setup?: { setupId: string; revisionId: string } } = {},
): Promise<StudyFixture> {
  let base: { setupId: string; revisionId: string };
  if (opts.setup) base = opts.setup;
  else {
    const f = await insertSetup(db, workspaceId, author.id, [exampleSetup()]);
    base = { setupId: f.setupId, revisionId: f.revisionIds[0] };
  }
  const ws = { workspaceId };
  const created = await createStudy(db, ws, actorOf(author), { definition: StudyDefinition.parse(studyDefinition(base)) }, new Date());
  if (!created.ok) throw new Error(created.message);
  let detail = created.value;
  if (opts.results === 'first-point' || opts.results === 'complete') {
    const uploads = uploadsFor(detail);
    const chosen = opts.results === 'complete' ? uploads : uploads.filter((u) => u.index === 0);
    const saved = await saveStudyPoints(db, ws, detail.id, { points: chosen }, new Date());
    if (!saved.ok) throw new Error(saved.message);
    if (opts.results === 'complete') {
      const finished = await finishStudyRun(db, ws, actorOf(author), detail.id, { status: 'complete', elapsedMs: 100, workers: 2 }, new Date());
      if (!finished.ok) throw new Error(finished.message);
      detail = finished.value;
    }
  }
  return { ...base, studyId: detail.id, detail };
}
