import { randomUUID } from 'node:crypto';
import type { Role } from '../../../shared/schemas/workspace.ts';
import { hashPassword } from '../../auth/password.ts';
import type { Queryable } from '../database.ts';
import type { SeedContext } from './seed-context.ts';
import { DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE_NAME } from '../../core/demo-people.ts';

/** The demo workspace and one user per role; the first step of `seedDemo`. */
export async function seedDemoPeople(db: Queryable, now: Date): Promise<SeedContext> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const at = now.toISOString();
  const workspaceId = randomUUID();
  const users = {} as Record<Role, string>;
  await db.insertInto('workspace').values({ id: workspaceId, name: DEMO_WORKSPACE_NAME, created_at: at }).execute();
  for (const u of DEMO_USERS) {
    const id = randomUUID();
    users[u.role] = id;
    await db.insertInto('user').values({ id, email: u.email, name: u.name, password_hash: passwordHash, session_version: 0, created_at: at, email_verified_at: at }).execute();
    await db.insertInto('membership').values({ workspace_id: workspaceId, user_id: id, role: u.role, created_at: at }).execute();
  }
  await db
    .insertInto('audit_log')
    .values({
      id: randomUUID(),
      workspace_id: workspaceId,
      actor_id: users.admin,
      action: 'workspace.created',
      entity_type: 'workspace',
      entity_id: workspaceId,
      summary: `Demo workspace "${DEMO_WORKSPACE_NAME}" seeded with one member per role.`,
      at,
    })
    .execute();
  return { workspaceId, users, now };
}
