import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { Road } from '../shared/schemas/road.ts';
import { Setup } from '../shared/schemas/setup.ts';
import { StudyDefinition } from '../shared/schemas/study.ts';
import type { z } from 'zod';

/**
 * Reads a study file for the headless runner:
 *
 *   { "baseSetup": "pipit-front.setup.json" | { …setup… },
 *     "study": { …study definition…, "roads": [ { "source": "file", "path": "iso-c.road.json" }
 *                                             | { "source": "inline", "road": { … } } ] } }
 *
 * Paths are relative to the study file. The definition is checked with the schema the browser's
 * study uses (`base` may be left out: the base setup comes from the file); a road given as a file
 * becomes an inline road. Problems name the field (`study.axes.0.steps`) or the file's line.
 */
export class StudyInputError extends Error {}

export interface StudyInput {
  definition: StudyDefinition;
  baseSetup: Setup;
  /** The definition's roads, in its order. */
  roads: Road[];
}

/** JSON.parse with the line and column of a syntax error. */
function parseJson(text: string, path: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    const message = (e as Error).message;
    const at = /position (\d+)/.exec(message);
    if (at) {
      const before = text.slice(0, Number(at[1]));
      const line = before.split('\n').length;
      const column = Number(at[1]) - before.lastIndexOf('\n');
      throw new StudyInputError(`${path} line ${line}, column ${column}: not valid JSON (${message})`);
    }
    throw new StudyInputError(`${path}: not valid JSON (${message})`);
  }
}

function readJsonFile(path: string, field: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    throw new StudyInputError(`${field}: cannot read ${path}`);
  }
  return parseJson(text, path);
}

function issuesOf(error: z.ZodError, prefix: string): string {
  return error.issues.map((i) => `${[prefix, ...i.path.map(String)].filter(Boolean).join('.')}: ${i.message}`).join('\n');
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

function resolveRoadEntry(entry: unknown, i: number, dir: string): unknown {
  if (!isObject(entry) || entry.source !== 'file') return entry;
  const { path, ...rest } = entry;
  if (typeof path !== 'string') throw new StudyInputError(`study.roads.${i}.path: give the road file's path`);
  const parsed = Road.safeParse(readJsonFile(resolve(dir, path), `study.roads.${i}.path`));
  if (!parsed.success) throw new StudyInputError(issuesOf(parsed.error, `study.roads.${i} (${path})`));
  return { ...rest, source: 'inline', road: parsed.data };
}

export function readStudyFile(path: string): StudyInput {
  const file = readJsonFile(path, '--study');
  const dir = dirname(resolve(path));
  if (!isObject(file)) throw new StudyInputError(`${path}: expected an object with "baseSetup" and "study"`);

  const setupRef = file.baseSetup;
  if (setupRef === undefined) throw new StudyInputError('baseSetup: required (a setup, or the path of a setup file)');
  const setupDoc = typeof setupRef === 'string' ? readJsonFile(resolve(dir, setupRef), 'baseSetup') : setupRef;
  const setup = Setup.safeParse(setupDoc);
  if (!setup.success) throw new StudyInputError(issuesOf(setup.error, typeof setupRef === 'string' ? `baseSetup (${setupRef})` : 'baseSetup'));

  const study = file.study;
  if (!isObject(study)) throw new StudyInputError('study: required (a study definition)');
  const roads = Array.isArray(study.roads) ? study.roads.map((r, i) => resolveRoadEntry(r, i, dir)) : study.roads;
  const definition = StudyDefinition.safeParse({ base: { setupId: 'file', revisionId: 'file' }, ...study, roads });
  if (!definition.success) throw new StudyInputError(issuesOf(definition.error, 'study'));

  const resolved = definition.data.roads.map((r, i) => {
    if (r.source !== 'inline') throw new StudyInputError(`study.roads.${i}.source: a library road needs the server; give "file" or "inline"`);
    return r.road;
  });
  return { definition: definition.data, baseSetup: setup.data, roads: resolved };
}
