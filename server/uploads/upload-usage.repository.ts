import { sql } from 'kysely';
import type { Queryable } from '../db/database.ts';

/**
 * Bytes of bulky material a workspace keeps: dyno files as received, the files of every
 * conformity check, measured road profiles as stored, road versions kept for studies, measured drives (file and
 * signals), and what studies store themselves (definition, base document, the road copies of older studies).
 * Each row keeps its own size (`bytes`, 0013), so this sums numbers and reads no stored file.
 */
export async function storedUploadBytes(db: Queryable, workspaceId: string): Promise<number> {
  const { rows } = await sql<{ total: number | null }>`
    select
      (select coalesce(sum(bytes), 0) from dyno_file where workspace_id = ${workspaceId})
      + (select coalesce(sum(c.bytes), 0) from dyno_check c join target_sheet s on s.id = c.sheet_id where s.workspace_id = ${workspaceId})
      + (select coalesce(sum(bytes), 0) from road where workspace_id = ${workspaceId} and source = 'measured')
      + (select coalesce(sum(bytes), 0) from road_version where workspace_id = ${workspaceId})
      + (select coalesce(sum(bytes), 0) from study where workspace_id = ${workspaceId})
      + (select coalesce(sum(bytes), 0) from drive where workspace_id = ${workspaceId})
      as total`.execute(db);
  return Number(rows[0]?.total ?? 0);
}
