import type { Queryable } from '../db/database.ts';
import type { NewRoadRow, RoadTable } from './roads.tables.ts';

/** SQL for the road library. */

export async function insertRoad(db: Queryable, row: NewRoadRow): Promise<void> {
  await db.insertInto('road').values(row).execute();
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
      'r.summary',
      'r.created_by',
      'r.created_at',
      'r.updated_by',
      'r.updated_at',
      'cu.name as created_by_name',
      'uu.name as updated_by_name',
      // the kind is read from the document so lists need not load measured points
      (eb) => eb.fn<string>('json_extract', ['r.definition', eb.val('$.kind')]).as('kind'),
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

export async function updateRoadRow(
  db: Queryable,
  workspaceId: string,
  roadId: string,
  patch: Partial<Pick<RoadTable, 'name' | 'definition' | 'source' | 'summary' | 'updated_by' | 'updated_at'>>,
): Promise<void> {
  await db.updateTable('road').set(patch).where('workspace_id', '=', workspaceId).where('id', '=', roadId).execute();
}

export async function deleteRoadRow(db: Queryable, workspaceId: string, roadId: string): Promise<void> {
  await db.deleteFrom('road').where('workspace_id', '=', workspaceId).where('id', '=', roadId).execute();
}
