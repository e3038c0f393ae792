import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import SQLite from 'better-sqlite3';
import { Kysely, SqliteDialect, type SqliteDatabase, type Transaction } from 'kysely';
import { isPostgresUrl, openPostgres } from './postgres.ts';
import { LRUCache } from 'lru-cache';
import type { ApiTokenTable } from '../api-tokens/api-tokens.tables.ts';
import type { AuditLogTable } from '../audit/audit.tables.ts';
import type { OutboxMessageTable, OutboxRecipientTable } from '../mail/outbox.tables.ts';
import type { RoadTable, RoadVersionTable } from '../roads/roads.tables.ts';
import type { DynoFileTable } from '../dyno/dyno-files.tables.ts';
import type { DriveTable } from '../drives/drives.tables.ts';
import type { RunTable } from '../runs/runs.tables.ts';
import type { SetupRevisionTable, SetupTable } from '../setups/setups.tables.ts';
import type { VehicleTable } from '../vehicles/vehicles.tables.ts';
import type { ShareLinkTable } from '../sharing/share-links.tables.ts';
import type { StudyPointTable, StudyTable } from '../studies/studies.tables.ts';
import type { StudyFleetRunTable } from '../fleet/fleet.tables.ts';
import type { DynoCheckTable, TargetSheetEventTable, TargetSheetTable } from '../target-sheets/target-sheets.tables.ts';
import type { ThrottleEventTable } from '../limits/throttle.tables.ts';
import type { InvitationTable } from '../workspaces/invitations.tables.ts';
import type { EmailVerificationTable } from '../accounts/email-verifications.tables.ts';
import type { PasswordResetTable } from '../accounts/password-resets.tables.ts';
import type { UserTable } from '../accounts/users.tables.ts';
import type { MembershipTable, WorkspaceTable } from '../workspaces/workspaces.tables.ts';

/**
 * Every table, keyed by its SQL name. A feature that adds a migration adds its table
 * interface (in `server/db/<name>-table.ts`) here too.
 */
export interface Database {
  user: UserTable;
  workspace: WorkspaceTable;
  membership: MembershipTable;
  invitation: InvitationTable;
  password_reset: PasswordResetTable;
  email_verification: EmailVerificationTable;
  audit_log: AuditLogTable;
  outbox_message: OutboxMessageTable;
  outbox_recipient: OutboxRecipientTable;
  setup: SetupTable;
  setup_revision: SetupRevisionTable;
  vehicle: VehicleTable;
  share_link: ShareLinkTable;
  road: RoadTable;
  road_version: RoadVersionTable;
  dyno_file: DynoFileTable;
  drive: DriveTable;
  run: RunTable;
  study: StudyTable;
  study_point: StudyPointTable;
  study_fleet_run: StudyFleetRunTable;
  target_sheet: TargetSheetTable;
  target_sheet_event: TargetSheetEventTable;
  dyno_check: DynoCheckTable;
  throttle_event: ThrottleEventTable;
  api_token: ApiTokenTable;
}

export type Db = Kysely<Database>;
/** What repositories take as their first argument: the database or an open transaction. */
export type Queryable = Kysely<Database> | Transaction<Database>;

/**
 * Opens the database named by `target`: a `postgres://` URL (DATABASE_URL) connects to
 * PostgreSQL; anything else is a SQLite file, created if needed, or `:memory:`.
 * On SQLite, WAL lets readers run beside the writer; the busy timeout makes a second process
 * wait instead of failing at once.
 */
export function openDatabase(target: string): Db {
  if (isPostgresUrl(target)) return openPostgres(target);
  const path = target;
  if (path !== ':memory:') mkdirSync(dirname(path), { recursive: true });
  const sqlite = new SQLite(path);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  return new Kysely<Database>({ dialect: new SqliteDialect({ database: withStatementCache(sqlite) }) });
}

/** How many distinct SQL texts keep their prepared statement: the app issues a few hundred. */
const STATEMENT_CACHE_SIZE = 500;

/**
 * Kysely prepares every query afresh; this hands it back the statement prepared last time for
 * the same SQL text instead (SQLite re-prepares by itself after a schema change). Safe because
 * nothing here streams (`.stream()` would hold a statement busy while another call wanted it)
 * and one connection runs one statement at a time.
 */
function withStatementCache(sqlite: SQLite.Database): SqliteDatabase {
  const statements = new LRUCache<string, SQLite.Statement>({ max: STATEMENT_CACHE_SIZE });
  return {
    close: () => sqlite.close(),
    prepare: (sql: string) => {
      let statement = statements.get(sql);
      if (!statement) {
        statement = sqlite.prepare(sql);
        statements.set(sql, statement);
      }
      return statement;
    },
  };
}
