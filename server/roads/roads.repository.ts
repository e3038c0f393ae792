import { sql } from 'kysely';
import { bytesAsText, textAsBytes } from '../db/dialect.ts';
import type { Queryable } from '../db/database.ts';
import type { NewRoadRow, RoadTable } from './roads.tables.ts';

/** SQL for the road library. */

/** A new road; its definition as text, or as UTF-8 bytes made in a worker (stored as the same text). */
export async function insertRoad(db: Queryable, row: Omit<NewRoadRow, 'definition'> & { definition: string | Uint8Array }): Promise<void> {
  const { definition, ...rest } = row;
  await db
    .insertInto('road')
    .values({ ...rest, definition: typeof definition === 'string' ? definition : bytesAsText(db, definition) })
    .execute();
}

/** Roads with the names of who made and last changed them; `withDefinition` adds the (possibly large) document. */
function roadQuery(db: Queryable, workspaceId: string) {
  return db
    .selectFrom('road as r')
    .innerJoin('user as cu', 'cu.id', 'r.created_by')
    .innerJoin('user as uu', 'uu.id', 'r.updated_by')
    .select([
      'r.id',
      'r.name',
      'r.source',
      'r.version',
      'r.summary',
      'r.created_by',
      'r.created_at',
      'r.updated_by',
      'r.updated_at',
      'cu.name as created_by_name',
      'uu.name as updated_by_name',
      'r.kind',
    ])
    .where('r.workspace_id', '=', workspaceId);
}

export type RoadListRow = Awaited<ReturnType<typeof listRoads>>[number];

export function listRoads(db: Queryable, workspaceId: string) {
  return roadQuery(db, workspaceId).orderBy('r.updated_at', 'desc').orderBy('r.id').execute();
}

export function findRoad(db: Queryable, workspaceId: string, roadId: string) {
  return roadQuery(db, workspaceId).select('r.definition').where('r.id', '=', roadId).executeTakeFirst();
}
export type RoadDetailRow = NonNullable<Awaited<ReturnType<typeof findRoad>>>;

/**
 * One road with its definition as UTF-8 bytes, for sending as it is: a measured road's
 * definition is megabytes, and reading it as bytes skips decoding it into a string and encoding
 * it back on the request thread.
 */
export function findRoadWithDefinitionBytes(db: Queryable, workspaceId: string, roadId: string) {
  return roadQuery(db, workspaceId).select(textAsBytes(db, 'r.definition').as('definition_bytes')).where('r.id', '=', roadId).executeTakeFirst();
}

/** One road as listed, without its (possibly large) definition. */
export function findRoadListItem(db: Queryable, workspaceId: string, roadId: string) {
  return roadQuery(db, workspaceId).where('r.id', '=', roadId).executeTakeFirst();
}

export async function updateRoadRow(
  db: Queryable,
  workspaceId: string,
  roadId: string,
  patch: Partial<Pick<RoadTable, 'name' | 'kind' | 'definition' | 'bytes' | 'source' | 'summary' | 'updated_by' | 'updated_at'>> & { version?: number },
): Promise<void> {
  await db.updateTable('road').set(patch).where('workspace_id', '=', workspaceId).where('id', '=', roadId).execute();
}

export async function deleteRoadRow(db: Queryable, workspaceId: string, roadId: string): Promise<void> {
  await db.deleteFrom('road').where('workspace_id', '=', workspaceId).where('id', '=', roadId).execute();
}

/** Whether any study of the workspace refers to this version of the road (`study.road_refs`). */
export async function isRoadVersionReferenced(db: Queryable, workspaceId: string, roadId: string, version: number): Promise<boolean> {
  // The text match narrows to studies naming the road at all; the refs are then read exactly.
  const rows = await db
    .selectFrom('study')
    .select('road_refs')
    .where('workspace_id', '=', workspaceId)
    .where('road_refs', 'like', `%${roadId}%`)
    .execute();
  return rows.some((r) => (JSON.parse(r.road_refs!) as ({ roadId: string; version: number } | null)[]).some((ref) => ref?.roadId === roadId && ref.version === version));
}

/**
 * Keeps the road's current definition as a version before it is replaced or removed (a study
 * still refers to it), copied inside the database so the document never passes through here.
 */
export async function keepCurrentRoadVersion(db: Queryable, workspaceId: string, roadId: string, at: string): Promise<void> {
  await db
    .insertInto('road_version')
    .columns(['road_id', 'version', 'workspace_id', 'definition', 'bytes', 'created_at'])
    .expression((eb) =>
      eb
        .selectFrom('road')
        .select(['id', 'version', 'workspace_id', 'definition', 'bytes', sql.lit(at).as('created_at')])
        .where('workspace_id', '=', workspaceId)
        .where('id', '=', roadId),
    )
    .onConflict((oc) => oc.doNothing())
    .execute();
}

/**
 * The stored definition text of each `{ roadId, version }` in the workspace: the library's
 * current one when the version matches, else the kept one. Missing refs are absent from the map.
 */
export async function findRoadDefinitionTexts(db: Queryable, workspaceId: string, refs: { roadId: string; version: number }[]): Promise<Map<string, string>> {
  const out = new Map<string, string>();
  if (refs.length === 0) return out;
  const ids = [...new Set(refs.map((r) => r.roadId))];
  const current = await db.selectFrom('road').select(['id', 'version', 'definition']).where('workspace_id', '=', workspaceId).where('id', 'in', ids).execute();
  for (const r of current) out.set(`${r.id}@${r.version}`, r.definition);
  const kept = await db.selectFrom('road_version').select(['road_id', 'version', 'definition']).where('workspace_id', '=', workspaceId).where('road_id', 'in', ids).execute();
  for (const r of kept) if (refs.some((ref) => ref.roadId === r.road_id && ref.version === r.version)) out.set(`${r.road_id}@${r.version}`, r.definition);
  return out;
}
