import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import type { Road, RoadInput } from '../../../shared/schemas/road.ts';
import type { SaveRunInputIn } from '../../../shared/schemas/run-record.ts';
import { Setup, type SetupInput } from '../../../shared/schemas/setup.ts';
import { toStoredSpectra, toStoredTraces } from '../../../shared/runs/stored-run.ts';
import { computeSpectra } from '../../../shared/sim/metrics/compute-metrics.ts';
import { runCorner } from '../../../shared/sim/run-corner.ts';
import type { Db } from '../../../server/db/database.ts';

/** The invented example corner shipped in examples/ (Brume Pipit front). */
export function exampleSetup(): SetupInput {
  return JSON.parse(readFileSync(new URL('../../../examples/pipit-front.setup.json', import.meta.url), 'utf8')) as SetupInput;
}

export const shortRoad: RoadInput = { kind: 'iso8608', name: 'Class C test stretch', class: 'C', seed: 7 };

export interface SetupFixture {
  setupId: string;
  revisionIds: string[];
}

/**
 * A setup with one revision per document, inserted straight into the tables the setups feature
 * owns (no HTTP, no audit entry), so run tests do not depend on the setups routes.
 */
export async function insertSetup(db: Db, workspaceId: string, authorId: string, documents: SetupInput[]): Promise<SetupFixture> {
  const setupId = randomUUID();
  const now = new Date().toISOString();
  const name = Setup.parse(documents[0]).name;
  await db
    .insertInto('setup')
    .values({ id: setupId, workspace_id: workspaceId, name, vehicle_id: null, corner: null, created_by: authorId, created_at: now, updated_by: authorId, updated_at: now, archived_at: null })
    .execute();
  const revisionIds: string[] = [];
  for (const [i, doc] of documents.entries()) {
    const id = randomUUID();
    revisionIds.push(id);
    await db
      .insertInto('setup_revision')
      .values({ id, setup_id: setupId, number: i + 1, document: JSON.stringify(Setup.parse(doc)), message: `revision ${i + 1}`, author_id: authorId, created_at: now, source: null })
      .execute();
  }
  return { setupId, revisionIds };
}

const cache = new Map<string, SaveRunInputIn>();

/**
 * A complete save body for `setup` on `road`: the run is computed with the same code the browser
 * worker calls (cached per input, a short run keeps the tests quick).
 */
export function saveBody(fixture: { setupId: string; revisionNumber: number }, setup: SetupInput, opts: { road?: RoadInput; speed?: number; duration?: number; name?: string } = {}): SaveRunInputIn {
  const road = opts.road ?? shortRoad;
  const speed = opts.speed ?? 20;
  const duration = opts.duration ?? 6;
  const key = JSON.stringify([setup, road, speed, duration]);
  let base = cache.get(key);
  if (!base) {
    const outcome = runCorner({ setup, road, speed, duration });
    if (!outcome.ok) throw new Error(`test run failed: ${outcome.reason}`);
    const spectra = computeSpectra(outcome.trace, { settleTime: outcome.result.settleTime });
    base = {
      name: 'Test run',
      setupId: '',
      revisionNumber: 1,
      setup,
      road: road as Road,
      speed,
      duration,
      result: outcome.result,
      traces: toStoredTraces(outcome.trace, outcome.result.settleTime),
      spectra: toStoredSpectra(spectra),
    };
    cache.set(key, base);
  }
  return { ...base, name: opts.name ?? base.name, setupId: fixture.setupId, revisionNumber: fixture.revisionNumber };
}
