import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { sql } from 'kysely';
import { describe, expect, it } from 'vitest';
import { openDatabase } from './database.ts';
import { createMigrator, migrateToLatest, migrations } from './migrator.ts';

describe('migrator', () => {
  it('lists every file in migrations/', () => {
    const dir = fileURLToPath(new URL('../../migrations/', import.meta.url));
    const files = readdirSync(dir)
      .filter((f) => f.endsWith('.ts') && !f.endsWith('.test.ts'))
      .map((f) => f.replace(/\.ts$/, ''));
    expect(Object.keys(migrations).sort()).toEqual(files.sort());
  });

  it('migrates a fresh database up, then all the way down', async () => {
    const db = openDatabase(':memory:');
    const up = await migrateToLatest(db);
    expect(up.error).toBeUndefined();
    expect(up.results?.map((r) => r.status)).toEqual(Object.keys(migrations).map(() => 'Success'));
    const fk = await sql<{ foreign_keys: number }>`pragma foreign_keys`.execute(db);
    expect(fk.rows[0]?.foreign_keys).toBe(1);
    const again = await migrateToLatest(db);
    expect(again.results).toEqual([]);

    const { NO_MIGRATIONS } = await import('kysely');
    const down = await createMigrator(db).migrateTo(NO_MIGRATIONS);
    expect(down.error).toBeUndefined();
    const tables = await sql<{ name: string }>`select name from sqlite_master where type = 'table' and name not like 'kysely_%' and name not like 'sqlite_%'`.execute(db);
    expect(tables.rows).toEqual([]);
    await db.destroy();
  });

  it('0023 fills the new road kind column from each stored definition', async () => {
    const db = openDatabase(':memory:');
    expect((await createMigrator(db).migrateTo('0018_api_tokens')).error).toBeUndefined();
    await sql`insert into user (id, email, name, password_hash, created_at) values ('u1', 'a@tallisbrume.example', 'A', 'x', '2026-01-01')`.execute(db);
    await sql`insert into workspace (id, name, created_at) values ('w1', 'W', '2026-01-01')`.execute(db);
    for (const [id, kind] of [['r1', 'measured'], ['r2', 'kerb']]) {
      const definition = JSON.stringify({ kind, name: id });
      await sql`insert into road (id, workspace_id, name, definition, source, summary, bytes, created_by, created_at, updated_by, updated_at)
        values (${id}, 'w1', ${id}, ${definition}, 'defined', '{}', 10, 'u1', '2026-01-01', 'u1', '2026-01-01')`.execute(db);
    }
    expect((await migrateToLatest(db)).error).toBeUndefined();
    const rows = await sql<{ id: string; kind: string }>`select id, kind from road order by id`.execute(db);
    expect(rows.rows).toEqual([{ id: 'r1', kind: 'measured' }, { id: 'r2', kind: 'kerb' }]);
    await db.destroy();
  });
});
