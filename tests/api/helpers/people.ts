import { randomUUID } from 'node:crypto';
import type { Role } from '../../../shared/schemas/workspace.ts';
import { hashPassword } from '../../../server/auth/password.ts';
import { CSRF_COOKIE, CSRF_HEADER, csrfNonce, makeCsrfToken } from '../../../server/auth/csrf.ts';
import { issueSessionToken, SESSION_COOKIE } from '../../../server/auth/session.ts';
import type { Db } from '../../../server/db/database.ts';
import type { TestApp } from './test-app.ts';

/** Every test user has this password (hashed once per process: scrypt is deliberately slow). */
export const TEST_PASSWORD = 'test-password-0123';
let hashed: Promise<string> | undefined;
const testPasswordHash = () => (hashed ??= hashPassword(TEST_PASSWORD));

export interface TestUser {
  id: string;
  email: string;
  name: string;
  password: string;
}

let counter = 0;
/** A unique address for this process. */
export function uniqueEmail(prefix = 'person'): string {
  counter += 1;
  return `${prefix}.${counter}.${randomUUID().slice(0, 6)}@ridewright.test`;
}

/** Inserts a user straight into the database (no HTTP, no audit entry), address confirmed unless `unconfirmed`. */
export async function createUser(db: Db, init: Partial<Omit<TestUser, 'id' | 'password'>> & { unconfirmed?: boolean } = {}): Promise<TestUser> {
  const user = { id: randomUUID(), email: init.email ?? uniqueEmail(), name: init.name ?? `Test Person ${counter}`, password: TEST_PASSWORD };
  await db
    .insertInto('user')
    .values({
      id: user.id,
      email: user.email,
      name: user.name,
      password_hash: await testPasswordHash(),
      session_version: 0,
      created_at: new Date().toISOString(),
      email_verified_at: init.unconfirmed ? null : new Date().toISOString(),
    })
    .execute();
  return user;
}

export async function createWorkspace(db: Db, name = 'Test workspace'): Promise<string> {
  const id = randomUUID();
  await db.insertInto('workspace').values({ id, name, created_at: new Date().toISOString() }).execute();
  return id;
}

export async function addMember(db: Db, workspaceId: string, userId: string, role: Role): Promise<void> {
  await db.insertInto('membership').values({ workspace_id: workspaceId, user_id: userId, role, created_at: new Date().toISOString() }).execute();
}

/** Headers for a signed-out caller that passes the CSRF check: a server-signed token as cookie and header. */
export function anonymousHeaders(t: Pick<TestApp, 'deps'>): Record<string, string> {
  const csrf = makeCsrfToken(t.deps.secret);
  return { Cookie: `${CSRF_COOKIE}=${csrf}`, [CSRF_HEADER]: csrf };
}

/**
 * Headers for a signed-in caller: a session token minted for the user's current session
 * version (so it stays valid after earlier cells signed out or changed a password) plus CSRF.
 */
export async function sessionHeaders(t: Pick<TestApp, 'db' | 'deps'>, userId: string): Promise<Record<string, string>> {
  const row = await t.db.selectFrom('user').select('session_version').where('id', '=', userId).executeTakeFirstOrThrow();
  const csrf = makeCsrfToken(t.deps.secret);
  const nonce = csrfNonce(t.deps.secret, csrf) ?? '';
  const token = await issueSessionToken(t.deps.secret, { userId, sessionVersion: row.session_version, csrf: nonce }, t.deps.clock());
  return { Cookie: `${SESSION_COOKIE}=${token}; ${CSRF_COOKIE}=${csrf}`, [CSRF_HEADER]: csrf };
}
