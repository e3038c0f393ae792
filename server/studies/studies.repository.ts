import type { Queryable } from '../db/database.ts';
import type { NewStudyPointRow, NewStudyRow, StudyTable } from './studies.tables.ts';

/** SQL for studies and their points. Study rows come back with the names of the people and the base setup. */

/** A study row with its stored size filled in (definition, base document, road copies), for the upload quota. */
export const withStudyBytes = (row: Omit<NewStudyRow, 'bytes'>): NewStudyRow => ({
  ...row,
  bytes: Buffer.byteLength(row.definition) + Buffer.byteLength(row.base_document) + Buffer.byteLength(row.roads),
});

export async function insertStudy(db: Queryable, row: NewStudyRow): Promise<void> {
  await db.insertInto('study').values(row).execute();
}

function studyQuery(db: Queryable, workspaceId: string) {
  return db
    .selectFrom('study')
    .innerJoin('user as cu', 'cu.id', 'study.created_by')
    .leftJoin('user as bu', 'bu.id', 'study.chosen_by')
    .leftJoin('setup as s', 's.id', 'study.base_setup_id')
    .selectAll('study')
    .select(['cu.name as created_by_name', 'bu.name as chosen_by_name', 's.name as base_setup_name'])
    .where('study.workspace_id', '=', workspaceId);
}

export type StudyViewRow = NonNullable<Awaited<ReturnType<typeof findStudy>>>;

/**
 * Most recently changed first. The list needs neither the base document nor the road copies of
 * older studies (either can be megabytes), so it does not read them.
 */
export function listStudies(db: Queryable, workspaceId: string) {
  return db
    .selectFrom('study')
    .innerJoin('user as cu', 'cu.id', 'study.created_by')
    .leftJoin('user as bu', 'bu.id', 'study.chosen_by')
    .leftJoin('setup as s', 's.id', 'study.base_setup_id')
    .select([
      'study.id',
      'study.name',
      'study.status',
      'study.definition',
      'study.base_setup_id',
      'study.base_revision_number',
      'study.planned_points',
      'study.planned_runs',
      'study.results',
      'study.baseline_point_index',
      'study.chosen_by',
      'study.chosen_at',
      'study.created_by',
      'study.created_at',
      'study.updated_at',
      'cu.name as created_by_name',
      'bu.name as chosen_by_name',
      's.name as base_setup_name',
    ])
    .where('study.workspace_id', '=', workspaceId)
    .orderBy('study.updated_at', 'desc')
    .orderBy('study.id')
    .execute();
}
export type StudyListRow = Awaited<ReturnType<typeof listStudies>>[number];

export function findStudy(db: Queryable, workspaceId: string, studyId: string) {
  return studyQuery(db, workspaceId).where('study.id', '=', studyId).executeTakeFirst();
}

/** A study by id alone (share links carry the workspace in their own row). */
export function findStudyById(db: Queryable, studyId: string) {
  return db.selectFrom('study').select(['workspace_id', 'name']).where('id', '=', studyId).executeTakeFirst();
}

export async function updateStudyRow(db: Queryable, studyId: string, patch: Partial<Omit<StudyTable, 'id' | 'workspace_id' | 'created_by' | 'created_at'>>): Promise<void> {
  await db.updateTable('study').set(patch).where('id', '=', studyId).execute();
}

export async function deleteStudyRow(db: Queryable, studyId: string): Promise<void> {
  await db.deleteFrom('study').where('id', '=', studyId).execute();
}

/** Inserts points, replacing any already saved at the same index (a run saved again gives the same values). */
export async function upsertStudyPoints(db: Queryable, rows: NewStudyPointRow[]): Promise<void> {
  // SQLite caps bound parameters per statement; 8 columns × 100 rows stays well inside it.
  for (let i = 0; i < rows.length; i += 100) {
    await db
      .insertInto('study_point')
      .values(rows.slice(i, i + 100))
      .onConflict((oc) =>
        oc.columns(['study_id', 'idx']).doUpdateSet((eb) => ({
          params: eb.ref('excluded.params'),
          metrics: eb.ref('excluded.metrics'),
          figures: eb.ref('excluded.figures'),
          objectives: eb.ref('excluded.objectives'),
          feasible: eb.ref('excluded.feasible'),
          reasons: eb.ref('excluded.reasons'),
        })),
      )
      .execute();
  }
}

/**
 * Inserts points not saved yet and leaves saved ones as they are (a retried chunk of the workers
 * gives the same values); returns the indices actually inserted.
 */
export async function insertStudyPointsOnce(db: Queryable, rows: NewStudyPointRow[]): Promise<number[]> {
  const inserted: number[] = [];
  for (let i = 0; i < rows.length; i += 100) {
    const got = await db
      .insertInto('study_point')
      .values(rows.slice(i, i + 100))
      .onConflict((oc) => oc.columns(['study_id', 'idx']).doNothing())
      .returning('idx')
      .execute();
    inserted.push(...got.map((r) => r.idx));
  }
  return inserted;
}

/** Indices of the saved points of a study (the base setup, −1, included). */
export async function listStudyPointIndices(db: Queryable, studyId: string): Promise<number[]> {
  return (await db.selectFrom('study_point').select('idx').where('study_id', '=', studyId).execute()).map((r) => r.idx);
}

/** Every saved point of a study, in sweep order (the base setup, −1, first). */
export function listStudyPoints(db: Queryable, studyId: string) {
  return db.selectFrom('study_point').selectAll().where('study_id', '=', studyId).orderBy('idx').execute();
}

export function findStudyPoint(db: Queryable, studyId: string, idx: number) {
  return db.selectFrom('study_point').selectAll().where('study_id', '=', studyId).where('idx', '=', idx).executeTakeFirst();
}


/** Library roads of the workspace among `ids`: names and current versions, never the (possibly large) definitions. */
export function findLibraryRoads(db: Queryable, workspaceId: string, ids: string[]) {
  if (ids.length === 0) return Promise.resolve([]);
  return db.selectFrom('road').select(['id', 'name', 'version']).where('workspace_id', '=', workspaceId).where('id', 'in', ids).execute();
}
